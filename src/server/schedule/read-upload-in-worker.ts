import "server-only";
import { Worker } from "node:worker_threads";
import type { TSheet } from "@/schemas/schedule";
import { AppError } from "@/server/http/app-error";
import type { Tables, UploadFormat } from "./read-upload";
import { UPLOAD_LIMITS, UploadError } from "./upload-limits";
import { checkXlsxArchive } from "./xlsx-archive";

type WorkerAnswer = { ok: true; tables: Tables } | { ok: false; code: UploadError["code"]; message: string; details?: unknown };

const fileProblem = (message: string) => [{ row: 0, column: "", field: "file", message }];

// A small line of reads: at most `concurrentReads` workers (each may take `workerHeapMb` of
// memory) run at once, so a burst of uploads cannot add up to more memory than the machine has.
let running = 0;
const waiting: (() => void)[] = [];

async function takeSlot(): Promise<void> {
  if (running < UPLOAD_LIMITS.concurrentReads) {
    running++;
    return;
  }
  if (waiting.length >= UPLOAD_LIMITS.queuedReads) throw new AppError("unavailable", "Too many files are being read right now; try again in a minute");
  await new Promise<void>((resolve) => waiting.push(resolve));
}

function releaseSlot(): void {
  const next = waiting.shift();
  if (next) next();
  else running--;
}

function runWorker(input: { bytes: Uint8Array; format: UploadFormat; sheet?: TSheet }): Promise<Tables> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(new URL("./upload-worker.ts", import.meta.url), {
      workerData: input,
      resourceLimits: { maxOldGenerationSizeMb: UPLOAD_LIMITS.workerHeapMb, maxYoungGenerationSizeMb: 64, codeRangeSizeMb: 64, stackSizeMb: 4 },
      stdout: false,
      stderr: false,
    });
    let settled = false;
    const settle = (fn: () => void) => {
      if (settled) return;
      settled = true;
      clearTimeout(timer);
      void worker.terminate();
      fn();
    };
    const timer = setTimeout(() => {
      settle(() => reject(new AppError("payload_too_large", `The file took longer than ${UPLOAD_LIMITS.workerTimeMs / 1000} s to read, longer than an import may take; split it into smaller files`, fileProblem("Reading timed out"))));
    }, UPLOAD_LIMITS.workerTimeMs);
    worker.on("message", (answer: WorkerAnswer) => {
      settle(() => (answer.ok ? resolve(answer.tables) : reject(new AppError(answer.code, answer.message, answer.details))));
    });
    worker.on("error", (error: Error & { code?: string }) => {
      if (error.code === "ERR_WORKER_OUT_OF_MEMORY") {
        settle(() => reject(new AppError("payload_too_large", `Reading the file needs more than the ${UPLOAD_LIMITS.workerHeapMb} MB an import may use; split it into smaller files`, fileProblem("Out of memory while reading"))));
      } else {
        console.error("upload worker failed:", error);
        settle(() => reject(new AppError("invalid_input", "The file could not be read", fileProblem("Not a readable file"))));
      }
    });
    worker.on("exit", (code) => settle(() => reject(new AppError("invalid_input", "The file could not be read", fileProblem(`The reader stopped (exit code ${code})`)))));
  });
}

/**
 * The tables of an uploaded CSV or XLSX, matched columns only, read in a worker thread whose
 * heap and time are capped: a hostile file costs its sender a 4xx and the server nothing else.
 * An XLSX's declared sizes and worksheet dimensions are checked first, before anything inflates.
 */
export async function readUploadInWorker(input: { bytes: Uint8Array; format: UploadFormat; sheet?: TSheet }): Promise<Tables> {
  try {
    if (input.format === "xlsx") checkXlsxArchive(input.bytes);
  } catch (error) {
    if (error instanceof UploadError) throw new AppError(error.code, error.message, error.details);
    throw error;
  }
  await takeSlot();
  try {
    return await runWorker(input);
  } finally {
    releaseSlot();
  }
}

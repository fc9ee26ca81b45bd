// The worker thread that reads an uploaded CSV or XLSX (started by read-upload-in-worker.ts with
// capped memory and time): whatever a file makes the parser do happens here, not on the thread
// that serves every other request. No "server-only" import: its default export throws in a worker.
import { parentPort, workerData } from "node:worker_threads";
import { readUpload, type ReadUploadInput } from "./read-upload";
import { UploadError } from "./upload-limits";

readUpload(workerData as ReadUploadInput).then(
  (tables) => parentPort!.postMessage({ ok: true, tables }),
  (error: unknown) => {
    if (error instanceof UploadError) parentPort!.postMessage({ ok: false, code: error.code, message: error.message, details: error.details });
    else parentPort!.postMessage({ ok: false, code: "invalid_input", message: "The file could not be read", details: [{ row: 0, column: "", field: "file", message: String((error as Error)?.message ?? error).slice(0, 200) }] });
  },
);

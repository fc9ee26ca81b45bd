// The compiled command-line calculator: scripts/calc.ts bundled by esbuild into plain JavaScript
// (.build/calc/calc.mjs, with zod in a chunk loaded only for a malformed body), so `npm run calc` starts without a TypeScript loader (tsx
// costs ≈ 0.8 s per start). Rebuilt on demand when any file it was built from changed; esbuild is a
// local devDependency, so this works offline on a fresh clone after `npm ci`.
import { mkdirSync, readFileSync, renameSync, statSync, writeFileSync } from "node:fs";
import { basename, dirname, isAbsolute, join, relative } from "node:path";
import { fileURLToPath } from "node:url";

export const ROOT = join(dirname(fileURLToPath(import.meta.url)), "..", "..");
export const CALC_ENTRY = join(ROOT, "scripts", "calc.ts");
export const CALC_BUNDLE = join(ROOT, ".build", "calc", "calc.mjs");
/** The second thread of a large body (scripts/calc-worker.ts), bundled beside the CLI as calc-worker.mjs. */
export const CALC_WORKER_ENTRY = join(ROOT, "scripts", "calc-worker.ts");
const SELF = fileURLToPath(import.meta.url);

const manifestPath = (outfile) => join(dirname(outfile), "inputs.json");

/** Size and modification time of a file, or null when it is gone. */
function stamp(path) {
  try {
    const s = statSync(path);
    return `${s.size}:${s.mtimeMs}`;
  } catch {
    return null;
  }
}

/**
 * True when the bundle is missing or any file it was built from (its sources, the packages it
 * bundles, this builder) changed since. A stat per input (≈ 100 files): about a millisecond.
 */
export function bundleIsStale(outfile = CALC_BUNDLE) {
  let manifest;
  try {
    manifest = JSON.parse(readFileSync(manifestPath(outfile), "utf8"));
  } catch {
    return true;
  }
  if (stamp(outfile) === null) return true;
  for (const [path, was] of Object.entries(manifest.inputs ?? {})) {
    if (stamp(isAbsolute(path) ? path : join(ROOT, path)) !== was) return true;
  }
  return false;
}

/**
 * Bundles `entry` into `outfile` (ESM for Node 20; lazily imported modules go to chunk files
 * beside it) and records its inputs. Give each bundle a folder of its own.
 */
export async function buildBundle(entry = CALC_ENTRY, outfile = CALC_BUNDLE) {
  const { build } = await import("esbuild");
  const outdir = dirname(outfile);
  // The CLI's own bundle carries its worker (same chunks, so the engine is bundled once).
  const entryPoints = { [basename(outfile, ".mjs")]: entry };
  if (entry === CALC_ENTRY) entryPoints["calc-worker"] = CALC_WORKER_ENTRY;
  const result = await build({
    entryPoints,
    outdir,
    entryNames: "[name]",
    outExtension: { ".js": ".mjs" },
    splitting: true,
    chunkNames: "chunk-[hash]",
    bundle: true,
    platform: "node",
    format: "esm",
    target: "node20",
    write: false,
    metafile: true,
    logLevel: "error",
    absWorkingDir: ROOT,
  });
  const inputs = {};
  for (const path of [...Object.keys(result.metafile.inputs), SELF]) {
    const abs = isAbsolute(path) ? path : join(ROOT, path);
    const key = abs.startsWith(ROOT) ? relative(ROOT, abs) : abs;
    inputs[key] = stamp(abs);
  }
  mkdirSync(outdir, { recursive: true });
  // Write then rename, chunks (named by their content's hash) before the entry and the entry
  // before the manifest, so a process starting meanwhile never runs half a build.
  const atomicWrite = (path, contents) => {
    const tmp = `${path}.${process.pid}.tmp`;
    writeFileSync(tmp, contents);
    renameSync(tmp, path);
  };
  const entryFile = result.outputFiles.find((f) => f.path === outfile);
  if (!entryFile) throw new Error(`esbuild wrote no ${outfile}`);
  for (const f of result.outputFiles) if (f !== entryFile) atomicWrite(f.path, f.contents);
  atomicWrite(outfile, entryFile.contents);
  atomicWrite(manifestPath(outfile), JSON.stringify({ entry: relative(ROOT, entry), inputs }, null, 1));
}

/** Builds the bundle when it is stale; returns its path. */
export async function ensureBundle(entry = CALC_ENTRY, outfile = CALC_BUNDLE) {
  if (bundleIsStale(outfile)) await buildBundle(entry, outfile);
  return outfile;
}

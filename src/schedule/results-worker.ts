/**
 * Starts the results worker. The `new Worker(new URL("./…", import.meta.url), { type: "module" })`
 * form, beside the worker's file, is what the bundler recognises and bundles as a worker.
 */
export function startResultsWorker(): Worker {
  return new Worker(new URL("./results.worker.ts", import.meta.url), { type: "module" });
}

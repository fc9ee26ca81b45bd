// Types for calc-bundle.mjs, used by the CLI benchmark and tests.
export const ROOT: string;
export const CALC_ENTRY: string;
export const CALC_BUNDLE: string;
export const CALC_WORKER_ENTRY: string;
export function bundleIsStale(outfile?: string): boolean;
export function buildBundle(entry?: string, outfile?: string): Promise<void>;
export function ensureBundle(entry?: string, outfile?: string): Promise<string>;

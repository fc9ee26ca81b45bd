// Types for compile-hints.mjs (plain JavaScript so the start script runs it before anything is compiled).
export const COMPILE_HINT: string;
export const AG_GRID_MARKER: string;
export function markEagerChunks(dir: string, marker?: string): string[];
export function markBuild(root: string): void;

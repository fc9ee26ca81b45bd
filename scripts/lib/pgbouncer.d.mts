// Types for the parts of pgbouncer.mjs the TypeScript benchmarks and tests use.
import type { Service } from "./proc.mjs";
export const PGBOUNCER: string;
export function ensurePgbouncer(): void;
export function startPgbouncer(opts: { port: number; pgPort: number; dir: string; poolSize?: number }): { service: Service; ready: () => Promise<void>; url: (database: string) => string };

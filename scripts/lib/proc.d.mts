// Types for the parts of proc.mjs the TypeScript benchmarks use.
import type { ChildProcess } from "node:child_process";
export interface Service {
  name: string;
  child: ChildProcess;
  exited: boolean;
  exitCode: number | string | null;
}
export function assertPortFree(port: number, what: string): Promise<void>;
export function stopService(service: Service, graceMs?: number): Promise<void>;

// Types for the parts of proc.mjs the TypeScript benchmarks use.
export interface Service {
  name: string;
  exited: boolean;
}
export function assertPortFree(port: number, what: string): Promise<void>;
export function stopService(service: Service, graceMs?: number): Promise<void>;

// Types for the parts of services.mjs the TypeScript benchmarks use.
import type { Service } from "./proc.mjs";
export const DEFAULT_DEMO_PASSWORD: string;
export function portFromEnv(name: string, fallback: number): number;
export function startApp(port: number, env: Record<string, string>, opts?: { name?: string }): { service: Service; ready: () => Promise<unknown> };
export function startWorker(env: Record<string, string>, opts?: { name?: string }): { service: Service };
export function instancePorts(port: number, count: number): number[];
export function instancesFromArgs(argv?: string[]): number;

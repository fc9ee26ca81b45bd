// Types for the parts of balancer.mjs the TypeScript benchmarks and tests use.
import type { Service } from "./proc.mjs";
export const NGINX: string;
export function ensureNginx(): void;
export function nginxConfig(opts: { port: number; upstreams: number[]; dir: string }): string;
export function startBalancer(port: number, upstreams: number[], opts?: { dir?: string }): { service: Service; dir: string; ready: () => Promise<unknown> };

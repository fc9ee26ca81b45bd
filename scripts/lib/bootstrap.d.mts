// Types for the parts of bootstrap.mjs the TypeScript benchmarks use (plain JavaScript so the
// start and test scripts run before anything is compiled).
export const ROOT: string;
export function ensureNodeModules(): void;
export function ensurePostgres(): void;
export function clusterDir(name: string): string;
export function startCluster(opts: { dir: string; port: number; forTests?: boolean }): Promise<void>;
export function stopCluster(dir: string): void;
export function databaseUrl(port: number, database: string): string;
export function ensureDatabase(url: string, opts?: { fresh?: boolean }): Promise<void>;
export function knex(args: string[], env: Record<string, string>): void;
export function ensureBuild(): void;
export function aptInstall(pkg: string): void;
export function clusterRunning(dir: string): boolean;
export function restartCluster(dir: string): Promise<void>;
export const DB_USER: string;
export const DB_PASSWORD: string;

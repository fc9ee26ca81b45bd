// Several app instances as separate processes (`next start` of the production build), a job
// worker process and the nginx balancer in front: the deployment of docs/scaling.md, on loopback.
import { rmSync } from "node:fs";
import { createServer } from "node:net";
import { startBalancer, ensureNginx } from "../../scripts/lib/balancer.mjs";
import { stopService, type Service } from "../../scripts/lib/proc.mjs";
import { startApp, startWorker } from "../../scripts/lib/services.mjs";

/** A TCP port on 127.0.0.1 that was free a moment ago. */
export async function freeTcpPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const { port } = server.address() as { port: number };
  await new Promise((resolve) => server.close(resolve));
  return port;
}

/** Why nginx cannot be had on this machine, or undefined when it is there (installing it if need be). */
export function nginxMissing(): string | undefined {
  try {
    ensureNginx();
    return undefined;
  } catch (error) {
    return error instanceof Error ? error.message : String(error);
  }
}

export interface Deployment {
  balancer: string;
  instances: string[];
  /** Process-group ids of the web instances (each `next start` and its children). */
  instanceGroups: number[];
  worker: Service;
  /** Stops the worker alone (e.g. to kill it in the middle of a job); `signal` defaults to SIGKILL. */
  killWorker: (signal?: NodeJS.Signals) => Promise<void>;
  /** Starts a new worker process in place of the old one. */
  restartWorker: () => void;
  stop: () => Promise<void>;
}

/**
 * `count` web instances (JOBS_WORKER=off) on free ports, one worker process, and nginx on a free
 * port in front; all with `env` (DATABASE_URL, AUTH_SECRET, SMTP_URL …). Resolves when the
 * balancer answers /api/health.
 */
export async function startDeployment(count: number, env: Record<string, string>, { worker = true } = {}): Promise<Deployment> {
  const ports = await Promise.all(Array.from({ length: count }, () => freeTcpPort()));
  const front = await freeTcpPort();
  const appEnv = { APP_URL: `http://localhost:${front}`, ...env };
  const services: Service[] = [];
  const apps = ports.map((port, i) => startApp(port, { ...appEnv, JOBS_WORKER: "off" }, { name: `next ${i + 1}` }));
  services.push(...apps.map((a) => a.service));
  let current = worker ? startWorker(appEnv).service : undefined;
  let balancerDir: string | undefined;
  const stop = async () => {
    for (const s of [...services].reverse()) await stopService(s);
    if (current) await stopService(current);
    if (balancerDir) rmSync(balancerDir, { recursive: true, force: true });
  };
  try {
    await Promise.all(apps.map((a) => a.ready()));
    const balancer = startBalancer(front, ports);
    balancerDir = balancer.dir;
    services.push(balancer.service);
    await balancer.ready();
  } catch (error) {
    await stop();
    throw error;
  }
  return {
    balancer: `http://127.0.0.1:${front}`,
    instances: ports.map((p) => `http://127.0.0.1:${p}`),
    instanceGroups: apps.map((a) => a.service.child.pid!),
    get worker() {
      return current as Service;
    },
    killWorker: async (signal: NodeJS.Signals = "SIGKILL") => {
      const child = current?.child;
      if (!child?.pid || current?.exited) return;
      const gone = new Promise((resolve) => child.once("exit", resolve));
      process.kill(-child.pid, signal);
      await gone;
    },
    restartWorker: () => {
      current = startWorker(appEnv).service;
    },
    stop,
  };
}

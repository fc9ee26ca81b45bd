// The local services both commands run beside the app: the mail inbox and the Stripe stand-in,
// plus the settings that tie them together.
import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { ROOT, baseEnv } from "./bootstrap.mjs";
import { startService, waitForHttp } from "./proc.mjs";

export const DEFAULT_DEMO_PASSWORD = "filmsheet-demo";
export const DEMO_ACCOUNTS = [
  ["admin@demo.filmsheet.test", "firm admin"],
  ["consultant@demo.filmsheet.test", "consultant"],
  ["checker@demo.filmsheet.test", "checker"],
  ["viewer@demo.filmsheet.test", "viewer"],
  ["admin@other.filmsheet.test", "firm admin of a second firm"],
];

export function portFromEnv(name, fallback) {
  const raw = process.env[name];
  if (raw === undefined || raw === "") return fallback;
  const port = Number(raw);
  if (!Number.isInteger(port) || port < 1 || port > 65535) throw new Error(`${name} must be a port number, got "${raw}"`);
  return port;
}

/** AUTH_SECRET from the environment, or one generated once and kept in .data (git-ignored). */
export function authSecret() {
  if (process.env.AUTH_SECRET) return process.env.AUTH_SECRET;
  const file = join(ROOT, ".data", "auth-secret");
  if (!existsSync(file)) {
    mkdirSync(join(ROOT, ".data"), { recursive: true });
    writeFileSync(file, randomBytes(32).toString("base64url"), { mode: 0o600 });
  }
  return readFileSync(file, "utf8").trim();
}

/** The webhook signing secret shared by the stand-in and the app (local runs only). */
export const LOCAL_WEBHOOK_SECRET = "whsec_filmsheet_local";

/**
 * The Stripe stand-in, posting signed webhooks to the app on `appPort`. `stateFile` keeps its
 * customers and subscriptions across restarts (npm start); without it, state lives in memory.
 */
export function startStripeStandIn(port, { appPort, stateFile } = {}) {
  const service = startService("stripe stand-in", process.execPath, ["--import", "tsx", join(ROOT, "scripts/stripe-stand-in.ts")], {
    cwd: ROOT,
    env: baseEnv({
      STRIPE_STAND_IN_PORT: String(port),
      STRIPE_STAND_IN_STATE: stateFile ?? "memory",
      STRIPE_WEBHOOK_SECRET: process.env.STRIPE_WEBHOOK_SECRET ?? LOCAL_WEBHOOK_SECRET,
      ...(appPort ? { STRIPE_WEBHOOK_URL: `http://127.0.0.1:${appPort}/api/webhooks/stripe` } : {}),
    }),
  });
  return { service, ready: () => waitForHttp(`http://127.0.0.1:${port}/health`, { service, accept: (s) => s === 200 }) };
}

export function startMaildev(smtpPort, webPort) {
  const service = startService(
    "maildev",
    join(ROOT, "node_modules/.bin/maildev"),
    ["--ip", "127.0.0.1", "--web-ip", "127.0.0.1", "--smtp", String(smtpPort), "--web", String(webPort), "--silent"],
    { cwd: ROOT, env: { ...baseEnv(), NODE_NO_WARNINGS: "1" } },
  );
  return { service, ready: () => waitForHttp(`http://127.0.0.1:${webPort}/api/healthz`, { service, accept: (s) => s === 200 }) };
}

/** `next start` on 127.0.0.1 with the given environment; ready when /api/health says ok. */
export function startApp(port, env, { name = "next" } = {}) {
  const service = startService(name, join(ROOT, "node_modules/.bin/next"), ["start", "-H", "127.0.0.1", "-p", String(port)], {
    cwd: ROOT,
    env: baseEnv({ NODE_ENV: "production", PORT: String(port), ...env }),
  });
  return { service, ready: () => waitForHttp(`http://127.0.0.1:${port}/api/health`, { service, accept: (s) => s === 200, timeoutMs: 90000 }) };
}

/**
 * The job worker as a process of its own (`npm run worker`: report builds, e-mail, prunes),
 * with the app's environment. Ready once it says it is running.
 */
export function startWorker(env, { name = "worker" } = {}) {
  const service = startService(name, process.execPath, ["--conditions=react-server", "--import", "tsx", join(ROOT, "scripts/worker.ts")], {
    cwd: ROOT,
    env: baseEnv({ NODE_ENV: "production", ...env, JOBS_WORKER: "on" }),
  });
  return { service };
}

/**
 * Ports of the web instances: with one instance it listens on `port` itself; with more, the
 * balancer takes `port` and the instances `port + 1` … `port + n`.
 */
export function instancePorts(port, count) {
  return count <= 1 ? [port] : Array.from({ length: count }, (_, i) => port + 1 + i);
}

/** `--instances N` on the command line, else INSTANCES, else 1. */
export function instancesFromArgs(argv = process.argv.slice(2)) {
  const i = argv.indexOf("--instances");
  const raw = i >= 0 ? argv[i + 1] : argv.find((a) => a.startsWith("--instances="))?.split("=")[1] ?? process.env.INSTANCES;
  if (raw === undefined || raw === "") return 1;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 1 || n > 16) throw new Error(`--instances (or INSTANCES) must be a whole number from 1 to 16, got "${raw}"`);
  return n;
}

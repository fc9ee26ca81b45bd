// Child-process helpers for the start and test scripts: run to completion, or keep a
// long-running service whose whole process group we can stop later.
import { spawn, spawnSync } from "node:child_process";

/** Prints a step heading so a newcomer can follow what the bootstrap is doing. */
export function step(message) {
  console.log(`\n▸ ${message}`);
}

/** Runs a command to completion with inherited output; throws on a non-zero exit. */
export function run(cmd, args, options = {}) {
  const result = spawnSync(cmd, args, { stdio: "inherit", ...options });
  if (result.error) throw result.error;
  if (result.status !== 0) {
    throw new Error(`${cmd} ${args.join(" ")} exited with ${result.status ?? result.signal}`);
  }
  return result;
}

/** Runs a command to completion and returns its exit code (never throws on exit code). */
export function runStatus(cmd, args, options = {}) {
  const result = spawnSync(cmd, args, { stdio: "inherit", ...options });
  if (result.error) throw result.error;
  return result.status ?? 1;
}

/** Runs a command quietly and returns { status, stdout, stderr }. */
export function capture(cmd, args, options = {}) {
  const result = spawnSync(cmd, args, { encoding: "utf8", ...options });
  return { status: result.status ?? 1, stdout: result.stdout ?? "", stderr: result.stderr ?? "", error: result.error };
}

/** Async variant of runStatus, so the parent keeps handling signals while a long command runs. */
export function runAsync(cmd, args, options = {}) {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { stdio: "inherit", ...options });
    child.on("error", reject);
    child.on("exit", (code, signal) => resolve(code ?? (signal ? 1 : 0)));
  });
}

/**
 * Starts a long-running service in its own process group (detached), so a Ctrl-C in the
 * terminal reaches only this script, which then stops the services in order.
 */
export function startService(name, cmd, args, options = {}) {
  const child = spawn(cmd, args, { stdio: ["ignore", "inherit", "inherit"], detached: true, ...options });
  const service = { name, child, exited: false, exitCode: null };
  child.on("exit", (code, signal) => {
    service.exited = true;
    service.exitCode = code ?? signal;
  });
  child.on("error", (err) => {
    service.exited = true;
    console.error(`${name} failed to start: ${err.message}`);
  });
  return service;
}

/** Sends SIGTERM to a service's process group, then SIGKILL after a grace period. */
export async function stopService(service, graceMs = 8000) {
  if (!service || service.exited) return;
  const pgid = service.child.pid;
  const exited = new Promise((resolve) => service.child.once("exit", resolve));
  try {
    process.kill(-pgid, "SIGTERM");
  } catch {
    return;
  }
  const timer = new Promise((resolve) => setTimeout(() => resolve("timeout"), graceMs));
  if ((await Promise.race([exited, timer])) === "timeout") {
    try {
      process.kill(-pgid, "SIGKILL");
    } catch {
      /* already gone */
    }
  }
}

/** Polls a URL until it answers with an accepted status or the deadline passes. */
export async function waitForHttp(url, { timeoutMs = 60000, accept = (s) => s < 500, service } = {}) {
  const deadline = Date.now() + timeoutMs;
  let last = "no answer";
  while (Date.now() < deadline) {
    if (service?.exited) throw new Error(`${service.name} exited (${service.exitCode}) before ${url} answered`);
    try {
      const res = await fetch(url, { signal: AbortSignal.timeout(2000) });
      if (accept(res.status)) return res;
      last = `HTTP ${res.status}`;
    } catch (err) {
      last = err.cause?.code ?? err.message;
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`${url} did not become ready within ${timeoutMs} ms (last: ${last})`);
}

/** Fails fast with a clear message when a TCP port on 127.0.0.1 is already taken. */
export async function assertPortFree(port, what) {
  const net = await import("node:net");
  await new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once("error", () =>
      reject(new Error(`Port ${port} on 127.0.0.1 (${what}) is already in use. Stop whatever holds it, or set the port's environment variable.`)),
    );
    server.listen(port, "127.0.0.1", () => server.close(resolve));
  });
}

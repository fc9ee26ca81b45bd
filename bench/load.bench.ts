// Load benchmark of the scaled-out arrangement (npm run bench:load): two app instances (`next
// start` of the build, JOBS_WORKER=off), a job worker process and nginx in front, on a private
// PostgreSQL cluster of its own (.data/pg-load, fsync on), driven through the balancer by
// autocannon with API tokens:
//   1. mixed reads and single-row writes, LOAD_CLIENTS (50) clients for LOAD_SECONDS (60) s;
//   2. the same with PostgreSQL restarted (pg_ctl restart -m fast) at LOAD_RESTART_AT (20) s;
//   3. single-row updates alone at 20 clients for LOAD_UPDATE_SECONDS (20) s.
// Each run prints requests/s, p50/p95/p99, non-2xx counts by status, and the writes acknowledged
// against the writes the database holds (lost or doubled writes would show as a difference).
// It prints figures; it asserts nothing.
import autocannon from "autocannon";
import { createHash, randomBytes } from "node:crypto";
import { readFileSync, readdirSync } from "node:fs";
import { cpus, loadavg } from "node:os";
import knexFactory, { type Knex } from "knex";
import { clusterDir, databaseUrl, ensureBuild, ensureDatabase, ensureNodeModules, ensurePostgres, knex, restartCluster, startCluster, stopCluster } from "../scripts/lib/bootstrap.mjs";
import { DEFAULT_DEMO_PASSWORD, portFromEnv } from "../scripts/lib/services.mjs";
import { startDeployment } from "../test/support/instances";

const PG_PORT = portFromEnv("BENCH_LOAD_PG_PORT", 54379);
const INSTANCES = Number(process.env.LOAD_INSTANCES ?? 2);
const CLIENTS = Number(process.env.LOAD_CLIENTS ?? 50);
const SECONDS = Number(process.env.LOAD_SECONDS ?? 60);
const RESTART_AT = Number(process.env.LOAD_RESTART_AT ?? 20);
const UPDATE_SECONDS = Number(process.env.LOAD_UPDATE_SECONDS ?? 20);
// Three rows per client: a client that autocannon reconnects gets a fresh context, and so a row of its own.
const ROWS = Math.max(CLIENTS, 20) * 3;

/** A row one client updates: the version to send next, and what happened to its writes. */
type Row = { id: string; version: number; next: number; acked: number; inflight: boolean };

/** CPU seconds used so far by the processes of these process groups (from /proc). */
function groupsCpuSeconds(groups: number[]): number {
  let ticks = 0;
  for (const pid of readdirSync("/proc").filter((d) => /^\d+$/.test(d))) {
    try {
      const stat = readFileSync(`/proc/${pid}/stat`, "utf8");
      const f = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
      if (groups.includes(Number(f[2]))) ticks += Number(f[11]) + Number(f[12]);
    } catch {
      // the process ended while we looked
    }
  }
  return ticks / 100; // USER_HZ is 100 on Linux
}
let appGroups: number[] = [];

const quantile = (xs: number[], q: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.max(0, Math.ceil(q * s.length) - 1))] ?? NaN;
};

async function main() {
  ensureNodeModules();
  ensurePostgres();
  const dir = clusterDir("pg-load");
  await startCluster({ dir, port: PG_PORT });
  const url = databaseUrl(PG_PORT, "filmsheet_load");
  await ensureDatabase(url, { fresh: true });
  const env = { DATABASE_URL: url, NODE_ENV: "test", DEMO_PASSWORD: process.env.DEMO_PASSWORD ?? DEFAULT_DEMO_PASSWORD };
  knex(["migrate:latest"], env);
  knex(["seed:run"], env);
  ensureBuild();
  const db = knexFactory({ client: "pg", connection: url, pool: { min: 0, max: 2 } });
  const deployment = await startDeployment(INSTANCES, { DATABASE_URL: url, AUTH_SECRET: randomBytes(32).toString("base64url"), SMTP_URL: "smtp://127.0.0.1:1?ignoreTLS=true" });
  try {
    const { project, rows, token } = await arrange(db);
    const headers = { authorization: `Bearer ${token}` };
    appGroups = deployment.instanceGroups;
    console.log(`\nload benchmark, node ${process.version}: ${INSTANCES} instances + worker behind nginx (${deployment.balancer}), PostgreSQL 15 on :${PG_PORT}`);
    console.log(`machine: ${cpus().length} cores, load ${loadavg().map((l) => l.toFixed(1)).join(" ")} (shared: other work inflates latency)`);

    await mixed("mixed reads and writes", deployment.balancer, headers, project, rows, db);
    await mixed(`the same, PostgreSQL restarted at ${RESTART_AT} s`, deployment.balancer, headers, project, rows, db, async () => {
      const t = Date.now();
      await restartCluster(dir);
      console.log(`  (pg_ctl restart -m fast took ${((Date.now() - t) / 1000).toFixed(1)} s)`);
    });
    await updatesOnly(deployment.balancer, headers, project, rows, db);
  } finally {
    await db.destroy();
    await deployment.stop();
    stopCluster(dir);
  }
}

/** A paid demo firm, a consultant's API token and ROWS surfaces in the demo project. */
async function arrange(db: Knex) {
  const firm = await db("firms").where({ slug: "tarnbrook-sill" }).first("id");
  await db("firm_billing").insert({ firm_id: firm.id, subscription_status: "active", subscription_seats: 50 }).onConflict("firm_id").merge();
  const token = `fst_${randomBytes(32).toString("base64url")}`;
  await db("api_tokens").insert({ firm_id: firm.id, name: "load", role: "consultant", token_hash: createHash("sha256").update(token).digest("hex"), prefix: token.slice(0, 10), expires_at: new Date(Date.now() + 86_400_000) });
  const project = (await db("projects").where({ reference: "TS-2417" }).first("id")).id as string;
  const existing = await db("surfaces").where({ project_id: project }).select("*");
  const copies = [];
  for (let i = existing.length; i < ROWS; i++) {
    const { id: _id, created_at: _c, updated_at: _u, version: _v, ...rest } = existing[i % existing.length];
    copies.push({ ...rest, label: `Load panel ${i + 1}` });
  }
  if (copies.length) await db("surfaces").insert(copies);
  const rows: Row[] = (await db("surfaces").where({ project_id: project }).orderBy("label").limit(ROWS).select("id", "version")).map((r) => ({ ...r, next: r.version, acked: 0, inflight: false }));
  return { project, rows, token };
}

function report(title: string, latencies: number[], statuses: Map<number, number>, seconds: number, cpuSeconds: number) {
  const non2xx = [...statuses].filter(([s]) => s < 200 || s > 299);
  console.log(title);
  console.log(
    `  ${latencies.length} requests, ${(latencies.length / seconds).toFixed(0)}/s; p50 ${quantile(latencies, 0.5).toFixed(0)} ms, p95 ${quantile(latencies, 0.95).toFixed(0)} ms, p99 ${quantile(latencies, 0.99).toFixed(0)} ms; ` +
      `non-2xx ${non2xx.reduce((n, [, c]) => n + c, 0)}${non2xx.length ? ` (${non2xx.map(([s, c]) => `${s}: ${c}`).join(", ")})` : ""}`,
  );
  // CPU per request is what other work on a shared machine does not inflate.
  console.log(`  app CPU ${((cpuSeconds * 1000) / Math.max(1, latencies.length)).toFixed(1)} ms per request (web instances); machine load ${loadavg()[0]!.toFixed(1)}`);
}

/**
 * Waits for the requests the stop cut off. autocannon closes its connections when the time is up;
 * a PATCH whose body the app had already read still runs to its COMMIT a moment later. Read before
 * that, the row's version misses the commit, the next run's first PATCH of the row carries a stale
 * version (409), and the late commit counts as a lost or doubled write: the benchmark's timing, not
 * the app's. A single-row update takes well under a second here, even under this load (p99 below);
 * two seconds is ample.
 */
async function settle(ms = 2000): Promise<void> {
  await new Promise((r) => setTimeout(r, ms));
}

/**
 * Compares acknowledged writes with the versions in the database and resets the counters. A
 * write still in flight when autocannon stopped may have committed without an answer counted:
 * those rows may hold one commit more than acknowledged; any other difference is a lost or doubled write.
 */
async function checkWrites(db: Knex, rows: Row[], refused: number) {
  const now = new Map((await db("surfaces").whereIn("id", rows.map((r) => r.id)).select("id", "version")).map((r) => [r.id, r.version as number]));
  let acked = 0;
  let committed = 0;
  let inflight = 0;
  let unexplained = 0;
  for (const row of rows) {
    const held = now.get(row.id)! - row.version;
    acked += row.acked;
    committed += held;
    if (row.inflight) inflight++;
    if (held !== row.acked && !(row.inflight && held === row.acked + 1)) unexplained++;
    row.version = row.next = now.get(row.id)!;
    row.acked = 0;
    row.inflight = false;
  }
  console.log(`  writes: ${acked} acknowledged (200), ${committed} committed, ${refused} refused; ${inflight} in flight when the run stopped; rows with a lost or doubled write: ${unexplained}`);
}

/** The PATCH every client sends: its own row, with the version it last saw. */
function patchRequest(headers: Record<string, string>, project: string, rowOf: (ctx: Record<string, unknown>) => Row, onRefused: () => void) {
  return {
    method: "PATCH",
    headers: { ...headers, "content-type": "application/json" },
    setupRequest: (req: Record<string, unknown>, ctx: Record<string, unknown>) => {
      const row = rowOf(ctx);
      row.inflight = true;
      return { ...req, path: `/api/projects/${project}/surfaces/${row.id}`, body: JSON.stringify({ version: row.next, area_m2: 10 + (row.acked % 40) }) };
    },
    onResponse: (status: number, body: string, ctx: Record<string, unknown>) => {
      const row = rowOf(ctx);
      row.inflight = false;
      if (status === 200) {
        row.acked++;
        row.next = JSON.parse(body).version;
        return;
      }
      onRefused();
      // 409 names the row as it stands: carry on from there, as the grid does.
      if (status === 409) row.next = JSON.parse(body).error.details[0].current.version;
    },
  };
}

/** Per connection: read its row, update it with the version read, read the zones, read the project. */
async function mixed(title: string, base: string, headers: Record<string, string>, project: string, rows: Row[], db: Knex, fault?: () => Promise<void>) {
  let next = 0;
  let refused = 0;
  const latencies: number[] = [];
  const statuses = new Map<number, number>();
  const rowOf = (ctx: Record<string, unknown>) => (ctx.row ??= rows[next++ % rows.length]) as Row;
  const instance = autocannon({
    url: base,
    connections: CLIENTS,
    duration: SECONDS,
    // Generous: a request cut off by the client could commit unseen, which is not what we measure.
    timeout: 60,
    headers,
    requests: [
      {
        method: "GET",
        setupRequest: (req: Record<string, unknown>, ctx: Record<string, unknown>) => ({ ...req, path: `/api/projects/${project}/surfaces/${rowOf(ctx).id}` }),
      },
      patchRequest(headers, project, rowOf, () => refused++),
      { method: "GET", path: `/api/projects/${project}/zones` },
      { method: "GET", path: `/api/projects/${project}` },
    ] as never,
  } as never);
  instance.on("response", (_c: unknown, status: number, _b: number, ms: number) => {
    latencies.push(ms);
    statuses.set(status, (statuses.get(status) ?? 0) + 1);
  });
  const cpu0 = groupsCpuSeconds(appGroups);
  const faulted = fault ? new Promise<void>((resolve, reject) => setTimeout(() => fault().then(resolve, reject), RESTART_AT * 1000)) : undefined;
  await instance;
  await faulted;
  report(`${title}: ${CLIENTS} clients, ${SECONDS} s (GET row, PATCH row, GET zones, GET project)`, latencies, statuses, SECONDS, groupsCpuSeconds(appGroups) - cpu0);
  await settle();
  await checkWrites(db, rows, refused);
}

/** PATCH of one surface at 20 clients, each on its own row with its current version. */
async function updatesOnly(base: string, headers: Record<string, string>, project: string, rows: Row[], db: Knex) {
  let next = 0;
  let refused = 0;
  const latencies: number[] = [];
  const statuses = new Map<number, number>();
  const rowOf = (ctx: Record<string, unknown>) => (ctx.row ??= rows[next++ % rows.length]) as Row;
  const instance = autocannon({
    url: base,
    connections: 20,
    duration: UPDATE_SECONDS,
    timeout: 60,
    headers,
    requests: [
      patchRequest(headers, project, rowOf, () => refused++),
    ] as never,
  } as never);
  instance.on("response", (_c: unknown, status: number, _b: number, ms: number) => {
    latencies.push(ms);
    statuses.set(status, (statuses.get(status) ?? 0) + 1);
  });
  const cpu0 = groupsCpuSeconds(appGroups);
  await instance;
  report(`single-row updates: 20 clients, ${UPDATE_SECONDS} s (goal p95 ≤ 50 ms)`, latencies, statuses, UPDATE_SECONDS, groupsCpuSeconds(appGroups) - cpu0);
  await settle();
  await checkWrites(db, rows, refused);
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});

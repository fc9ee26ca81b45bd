// Benchmark of the schedule API (npm run bench:api) with autocannon against the production
// build on loopback, on a private PostgreSQL cluster of its own (.data/pg-bench, fsync on):
//   1. GET /api/projects/:id/results for a 5,000-row project (4,000 surfaces, 1,000 duct runs),
//      one client after another: median and p95 (goal: median ≤ 300 ms);
//   2. PATCH of one surface at 20 concurrent clients, each on a different row with its current
//      version: median and p95 (goal: p95 ≤ 50 ms);
//   3. POST /import of a 10,000-row CSV into an empty project, three times (goal: ≤ 10 s).
// It prints figures against the goals; it asserts nothing.
import autocannon from "autocannon";
import { createHash, randomBytes } from "node:crypto";
import { readFileSync, readdirSync } from "node:fs";
import { cpus, loadavg } from "node:os";
import { performance } from "node:perf_hooks";
import knexFactory from "knex";
import { clusterDir, databaseUrl, ensureBuild, ensureDatabase, ensureNodeModules, ensurePostgres, knex, startCluster, stopCluster } from "../scripts/lib/bootstrap.mjs";
import { assertPortFree, stopService } from "../scripts/lib/proc.mjs";
import { DEFAULT_DEMO_PASSWORD, portFromEnv, startApp } from "../scripts/lib/services.mjs";
import { between, ductsCsv, newProject as makeProject, surfacesCsv } from "./lib/big-schedule";

const PG_PORT = portFromEnv("BENCH_PG_PORT", 54369);
const APP_PORT = portFromEnv("BENCH_APP_PORT", 3400);
const SECONDS = Number(process.env.BENCH_SECONDS ?? 15);
const BASE = `http://127.0.0.1:${APP_PORT}`;
const GOALS = { resultsMedianMs: 300, updateP95Ms: 50, importSeconds: 10 };
let appGroup = 0;

/**
 * CPU seconds used so far by the app's processes (its process group, from /proc): load tests
 * divide it by requests served, a figure that other work on a shared machine does not inflate.
 */
function groupCpuSeconds(pgid: number): number {
  let ticks = 0;
  for (const pid of readdirSync("/proc").filter((d) => /^\d+$/.test(d))) {
    try {
      const stat = readFileSync(`/proc/${pid}/stat`, "utf8");
      const f = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
      if (Number(f[2]) === pgid) ticks += Number(f[11]) + Number(f[12]);
    } catch {
      // the process ended while we looked
    }
  }
  return ticks / 100; // USER_HZ is 100 on Linux
}

const median = (xs: number[]) => quantile(xs, 0.5);
function quantile(xs: number[], q: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.max(0, Math.ceil(q * s.length) - 1))]!;
}

async function main() {
  ensureNodeModules();
  ensurePostgres();
  await assertPortFree(APP_PORT, "bench app; set BENCH_APP_PORT");
  const dir = clusterDir("pg-bench");
  await startCluster({ dir, port: PG_PORT });
  const url = databaseUrl(PG_PORT, "filmsheet_bench");
  await ensureDatabase(url, { fresh: true });
  const env = { DATABASE_URL: url, NODE_ENV: "test", DEMO_PASSWORD: process.env.DEMO_PASSWORD ?? DEFAULT_DEMO_PASSWORD };
  knex(["migrate:latest"], env);
  knex(["seed:run"], env);
  ensureBuild();
  const db = knexFactory({ client: "pg", connection: url, pool: { min: 0, max: 2 } });
  const app = startApp(APP_PORT, { DATABASE_URL: url, APP_URL: `http://localhost:${APP_PORT}`, AUTH_SECRET: randomBytes(32).toString("base64url"), SMTP_URL: "smtp://127.0.0.1:1?ignoreTLS=true", JOBS_WORKER: "off" });
  try {
    await app.ready();
    appGroup = (app.service as unknown as { child: { pid: number } }).child.pid;
    // A consultant's API token and a paid plan (the free plan stops at 40 rows) for the demo firm.
    const firm = await db("firms").where({ slug: "tarnbrook-sill" }).first("id");
    await db("firm_billing").insert({ firm_id: firm.id, subscription_status: "active", subscription_seats: 50 }).onConflict("firm_id").merge();
    const secret = `fst_${randomBytes(32).toString("base64url")}`;
    await db("api_tokens").insert({ firm_id: firm.id, name: "bench", role: "consultant", token_hash: createHash("sha256").update(secret).digest("hex"), prefix: secret.slice(0, 10), expires_at: new Date(Date.now() + 86_400_000) });
    const auth = { authorization: `Bearer ${secret}` };
    const call = async (method: string, path: string, body?: unknown, type = "application/json") => {
      const res = await fetch(`${BASE}${path}`, { method, headers: { ...auth, "content-type": type }, body: body === undefined ? undefined : typeof body === "string" ? body : JSON.stringify(body) });
      const json = await res.json();
      if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${JSON.stringify(json).slice(0, 400)}`);
      return json;
    };
    const newProject = (ref: string) => makeProject(call, ref);

    console.log(`\nschedule API benchmark, node ${process.version}, app on ${BASE}, ${SECONDS} s per load test`);
    const big = await newProject("BENCH-5000");
    const t0 = performance.now();
    await call("POST", `/api/projects/${big}/import?sheet=surfaces`, surfacesCsv(4000), "text/csv");
    await call("POST", `/api/projects/${big}/import?sheet=duct_runs`, ductsCsv(1000), "text/csv");
    console.log(`set-up: 5,000 rows imported in ${((performance.now() - t0) / 1000).toFixed(1)} s`);
    const caseId = (await call("GET", `/api/projects/${big}/design-cases`)).items.find((c: { kind: string }) => c.kind === "cooling").id;
    for (let i = 0; i < 3; i++) await call("GET", `/api/projects/${big}/results?case=${caseId}`); // warm-up

    const results = await load({ title: "GET results, 5,000 rows, 1 client", connections: 1, headers: auth, requests: [{ method: "GET", path: `/api/projects/${big}/results?case=${caseId}` }] });
    console.log(`  median ${results.median.toFixed(0)} ms, p95 ${results.p95.toFixed(0)} ms, ${results.count} requests, ${results.non2xx} not 2xx — goal: median ≤ ${GOALS.resultsMedianMs} ms`);
    const results4 = await load({ title: "GET results, 5,000 rows, 4 clients", connections: 4, headers: auth, requests: [{ method: "GET", path: `/api/projects/${big}/results?case=${caseId}` }] });
    console.log(`  median ${results4.median.toFixed(0)} ms, p95 ${results4.p95.toFixed(0)} ms, ${results4.count} requests, ${results4.non2xx} not 2xx`);

    // What any authenticated request costs here (token lookup, Next's handling), for comparison.
    const me = await load({ title: "reference: GET /api/me (the token check alone), 20 clients", connections: 20, headers: auth, requests: [{ method: "GET", path: "/api/me" }] });
    console.log(`  median ${me.median.toFixed(1)} ms, p95 ${me.p95.toFixed(1)} ms, ${me.count} requests (${(me.count / SECONDS).toFixed(0)}/s)`);

    // One row per request, never two requests on one row at once; each sends the version it last saw.
    const rows: { id: string; version: number }[] = (await db("surfaces").where({ project_id: big }).select("id", "version")).map((x) => ({ ...x }));
    let next = 0;
    const update = await load({
      title: "PATCH one surface, 20 clients",
      connections: 20,
      headers: auth,
      requests: [
        {
          method: "PATCH",
          headers: { ...auth, "content-type": "application/json" },
          setupRequest: (req: Record<string, unknown>, ctx: Record<string, unknown>) => {
            const row = rows[next++ % rows.length]!;
            ctx.row = row;
            return { ...req, path: `/api/projects/${big}/surfaces/${row.id}`, body: JSON.stringify({ version: row.version, area_m2: Number(between(2, 60)) }) };
          },
          onResponse: (status: number, body: string, ctx: Record<string, unknown>) => {
            if (status === 200) (ctx.row as { version: number }).version = JSON.parse(body).version;
          },
        },
      ],
    });
    console.log(`  median ${update.median.toFixed(1)} ms, p95 ${update.p95.toFixed(1)} ms, ${update.count} requests (${(update.count / SECONDS).toFixed(0)}/s), ${update.non2xx} not 2xx — goal: p95 ≤ ${GOALS.updateP95Ms} ms`);

    console.log("POST import, 10,000-row CSV into an empty project (3 runs)");
    const csv = surfacesCsv(10_000);
    const times: number[] = [];
    const cpuTimes: number[] = [];
    for (let i = 1; i <= 3; i++) {
      const p = await newProject(`BENCH-IMPORT-${i}`);
      const t = performance.now();
      const c = groupCpuSeconds(appGroup);
      const out = await call("POST", `/api/projects/${p}/import?sheet=surfaces`, csv, "text/csv");
      times.push((performance.now() - t) / 1000);
      cpuTimes.push(groupCpuSeconds(appGroup) - c);
      if (out.imported.surfaces !== 10_000) throw new Error(`imported ${JSON.stringify(out.imported)}`);
    }
    console.log(`  ${times.map((t) => `${t.toFixed(2)} s`).join(", ")}; median ${median(times).toFixed(2)} s (${(csv.length / 1e6).toFixed(1)} MB; app CPU ${median(cpuTimes).toFixed(2)} s) — goal: ≤ ${GOALS.importSeconds} s`);
  } finally {
    await db.destroy();
    await stopService(app.service);
    stopCluster(dir);
  }
}

/** One autocannon run; latencies of every response are kept, for an exact median and p95. */
async function load(opts: { title: string; connections: number; headers: Record<string, string>; requests: object[] }) {
  console.log(opts.title);
  const latencies: number[] = [];
  let non2xx = 0;
  const cpu0 = groupCpuSeconds(appGroup);
  const instance = autocannon({ url: BASE, connections: opts.connections, duration: SECONDS, headers: opts.headers, requests: opts.requests as never });
  instance.on("response", (_c: unknown, status: number, _b: number, ms: number) => {
    latencies.push(ms);
    if (status < 200 || status > 299) non2xx++;
  });
  await instance;
  const cpuMs = ((groupCpuSeconds(appGroup) - cpu0) * 1000) / Math.max(1, latencies.length);
  const out = { median: median(latencies), p95: quantile(latencies, 0.95), count: latencies.length, non2xx };
  console.log(`  app CPU ${cpuMs.toFixed(1)} ms per request; machine load ${loadavg()[0]!.toFixed(1)} on ${cpus().length} cores`);
  return out;
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});

// The web instances behind PgBouncer in transaction mode (DATABASE_POOL_URL), the worker on its
// direct connection: sign-in, reads, a versioned write and a report through the queue all work,
// and PgBouncer's own statistics show the app's transactions went through it.
import { rmSync } from "node:fs";
import request from "supertest";
import pg from "pg";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { clusterDir } from "../../scripts/lib/bootstrap.mjs";
import { stopService } from "../../scripts/lib/proc.mjs";
import { ensurePgbouncer, startPgbouncer } from "../../scripts/lib/pgbouncer.mjs";
import { closeTestDb, testDb } from "../support/db";
import { freeTcpPort, nginxMissing, startDeployment, type Deployment } from "../support/instances";
import { sessionCookie } from "../support/sessions";

const missing = (() => {
  try {
    ensurePgbouncer();
    return nginxMissing();
  } catch (error) {
    return error instanceof Error ? error.message : String(error);
  }
})();
if (missing) console.warn(`PgBouncer test skipped: ${missing}`);

const direct = new URL(process.env.DATABASE_URL ?? "postgres://x@127.0.0.1:1/x");
let bouncer: ReturnType<typeof startPgbouncer> | undefined;
let bouncerPort: number;
const dir = clusterDir(`pgbouncer-test-${process.pid}`);
let d: Deployment;

/** PgBouncer's transaction count for the test database, from its admin console. */
async function bouncedTransactions(): Promise<number> {
  const admin = new pg.Client({ host: "127.0.0.1", port: bouncerPort, user: decodeURIComponent(direct.username), password: decodeURIComponent(direct.password), database: "pgbouncer" });
  await admin.connect();
  try {
    const { rows } = await admin.query({ text: "SHOW STATS", queryMode: "simple" } as pg.QueryConfig);
    return Number(rows.find((r) => r.database === direct.pathname.slice(1))?.total_xact_count ?? 0);
  } finally {
    await admin.end();
  }
}

beforeAll(async () => {
  if (missing) return;
  bouncerPort = await freeTcpPort();
  bouncer = startPgbouncer({ port: bouncerPort, pgPort: Number(direct.port), dir, poolSize: 5 });
  await bouncer.ready();
  d = await startDeployment(1, {
    DATABASE_URL: process.env.DATABASE_URL!,
    DATABASE_POOL_URL: bouncer.url(direct.pathname.slice(1)),
    AUTH_SECRET: process.env.AUTH_SECRET!,
    SMTP_URL: "smtp://127.0.0.1:1?ignoreTLS=true",
  });
}, 180_000);
afterAll(async () => {
  await d?.stop();
  if (bouncer) await stopService(bouncer.service);
  rmSync(dir, { recursive: true, force: true });
  await closeTestDb();
});

describe.skipIf(Boolean(missing))("through PgBouncer in transaction mode", () => {
  test("sign-in, reads, a versioned write and a queued report work, and went through the pooler", async () => {
    const before = await bouncedTransactions();
    const cookie = await sessionCookie(d.balancer, "consultant@demo.filmsheet.test", process.env.DEMO_PASSWORD || "filmsheet-demo");
    const project = await testDb()("projects").where({ reference: "TS-2417" }).first("id");
    const surfaces = await request(d.balancer).get(`/api/projects/${project.id}/surfaces`).set("cookie", cookie);
    expect(surfaces.status).toBe(200);
    const row = surfaces.body.items[0];
    const patched = await request(d.balancer).patch(`/api/projects/${project.id}/surfaces/${row.id}`).set({ cookie, origin: d.balancer }).send({ version: row.version, area_m2: row.area_m2 });
    expect(patched.status, JSON.stringify(patched.body)).toBe(200);
    expect(patched.body.version).toBe(row.version + 1);
    const stale = await request(d.balancer).patch(`/api/projects/${project.id}/surfaces/${row.id}`).set({ cookie, origin: d.balancer }).send({ version: row.version, area_m2: row.area_m2 });
    expect(stale.status).toBe(409);

    const queued = await request(d.balancer).post(`/api/projects/${project.id}/reports`).set({ cookie, origin: d.balancer }).send({ kind: "draft" });
    expect(queued.status).toBe(202);
    await expect
      .poll(async () => (await request(d.balancer).get(`/api/projects/${project.id}/reports/${queued.body.id}`).set("cookie", cookie)).body.status, { timeout: 90_000, interval: 250 })
      .toBe("done");
    // SHOW STATS is refreshed every stats_period (2 s here): wait for a fresh figure.
    await expect.poll(bouncedTransactions, { timeout: 20_000, interval: 1000 }).toBeGreaterThan(before);
  }, 240_000);
});

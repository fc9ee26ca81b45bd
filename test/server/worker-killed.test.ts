// The worker killed in the middle of a report (SIGKILL: no chance to tidy up). graphile-worker
// would free the job only when its 4-hour lock expires; the workers notice the silent build
// (REPORT_STALL_SECONDS, shortened here) and queue it again. A new worker process builds it, and
// whoever follows the build sees it restart (its stage says so) and finish.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { grantPaidPlan } from "../support/billing";
import { closeTestDb, testDb } from "../support/db";
import { nginxMissing, startDeployment, type Deployment } from "../support/instances";
import { makeProject } from "../support/schedule-fixtures";
import { sessionCookie } from "../support/sessions";

const missing = nginxMissing();
if (missing) console.warn(`worker-killed test skipped: nginx is not installed and could not be (${missing})`);

const ROWS = 1500;
let d: Deployment;
let projectId: string;
let cookie: string;

beforeAll(async () => {
  if (missing) return;
  const fx = await makeProject("tarnbrook-sill");
  projectId = fx.projectId;
  await grantPaidPlan(fx.firmId);
  // A schedule large enough that its report takes several seconds to build.
  const [template] = await testDb()("surfaces").whereIn("id", fx.surfaceIds).select("*");
  const { id: _id, created_at: _c, updated_at: _u, version: _v, ...rest } = template;
  const copies = Array.from({ length: ROWS }, (_, i) => ({ ...rest, label: `Panel ${i + 1}` }));
  for (let i = 0; i < copies.length; i += 500) await testDb()("surfaces").insert(copies.slice(i, i + 500));
  d = await startDeployment(1, {
    DATABASE_URL: process.env.DATABASE_URL!,
    AUTH_SECRET: process.env.AUTH_SECRET!,
    SMTP_URL: "smtp://127.0.0.1:1?ignoreTLS=true",
    REPORT_STALL_SECONDS: "10",
  });
  cookie = await sessionCookie(d.balancer, "consultant@demo.filmsheet.test", process.env.DEMO_PASSWORD || "filmsheet-demo");
}, 180_000);
afterAll(async () => {
  await d?.stop();
  if (projectId) await testDb()("projects").where({ id: projectId }).delete();
  await closeTestDb();
});

describe.skipIf(Boolean(missing))("worker killed mid-report", () => {
  test("the build restarts on a new worker, the person following it sees that, and it finishes", async () => {
    const queued = await request(d.balancer).post(`/api/projects/${projectId}/reports`).set({ cookie, origin: d.balancer }).send({ kind: "draft" });
    expect(queued.status, JSON.stringify(queued.body)).toBe(202);
    const path = `/api/projects/${projectId}/reports/${queued.body.id}`;
    const poll = async () => (await request(d.balancer).get(path).set("cookie", cookie)).body as { status: string; progress: number; stage: string };

    // Wait until the build is under way, then kill its worker outright.
    await expect.poll(async () => (await poll()).progress, { timeout: 90_000, interval: 100 }).toBeGreaterThan(0);
    await d.killWorker("SIGKILL");
    const frozen = await poll();
    expect(frozen.status).toBe("running");
    expect(frozen.progress).toBeLessThan(1);

    d.restartWorker();
    const stages: string[] = [];
    const deadline = Date.now() + 150_000;
    let now = frozen;
    while (now.status !== "done" && now.status !== "failed" && Date.now() < deadline) {
      await new Promise((r) => setTimeout(r, 200));
      now = await poll();
      stages.push(now.stage);
    }
    expect(now.status).toBe("done");
    // Seen while it waits for a worker ("Restarting …") or as it runs again ("Restarted … · stage").
    expect(stages.some((s) => s.startsWith("Restart")), stages.join(" | ")).toBe(true);
    const row = await testDb()("report_builds").where({ id: queued.body.id }).first("pages", "byte_size");
    expect(row.pages).toBeGreaterThan(10);
  }, 300_000);
});

// Report builds never delay e-mail: on a queue of its own (a scratch database, so no app's worker
// takes these jobs), e-mail jobs carry a higher priority than report jobs, and the app's two
// runners keep report builds (one at a time) out of the slots that send e-mail. The real
// graphile-worker decides the order.
import { randomUUID } from "node:crypto";
import knexFactory, { type Knex } from "knex";
import { run, runMigrations, runOnce } from "graphile-worker";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { enqueueEmail, openEmailJob } from "@/server/jobs/enqueue-email";
import { jobRunnerOptions, REPORT_TASKS } from "@/server/jobs/runner-options";
import { BUILD_REPORT_TASK, enqueueReportBuild } from "@/server/reports/report-builds";
import { createScratchDatabase, dropScratchDatabase } from "../support/database";

const NAME = `filmsheet_test_jobs_${process.pid}`;
let url: string;
let q: Knex;

const resetMail = (to: string) => ({ kind: "password_reset" as const, to, subject: "Choose a new Filmsheet password", text: "Follow https://example.test/reset-password/abc", html: "<p>Follow</p>" });

beforeAll(async () => {
  url = await createScratchDatabase(NAME);
  q = knexFactory({ client: "pg", connection: url, pool: { min: 0, max: 2 } });
  await runMigrations({ connectionString: url });
});
afterAll(async () => {
  await q?.destroy();
  await dropScratchDatabase(NAME);
});

describe("e-mail jobs and report jobs", () => {
  test("are queued with e-mail ahead: report jobs at a lower priority", async () => {
    await enqueueReportBuild(q, randomUUID());
    await q.transaction((trx) => enqueueEmail(resetMail("first@jobs.test"), trx));
    const { rows } = await q.raw(
      `SELECT t.identifier, j.priority FROM graphile_worker._private_jobs j JOIN graphile_worker._private_tasks t ON t.id = j.task_id`,
    );
    const report = rows.find((r: { identifier: string }) => r.identifier === BUILD_REPORT_TASK);
    const email = rows.find((r: { identifier: string }) => r.identifier === "send_email");
    expect(email.priority).toBeLessThan(report.priority);

    // The worker takes the e-mail first, though the report was queued before it.
    const order: string[] = [];
    await runOnce({ connectionString: url, concurrency: 1, taskList: { [BUILD_REPORT_TASK]: async () => void order.push("report"), send_email: async (p) => void order.push(`email to ${openEmailJob(p).to}`) } });
    expect(order).toEqual(["email to first@jobs.test", "report"]);
  });

  test("with the app's runners, while a report builds a second waits and an e-mail goes out at once", async () => {
    expect(REPORT_TASKS).toContain(BUILD_REPORT_TASK);
    let release!: () => void;
    const released = new Promise<void>((r) => (release = r));
    let started!: () => void;
    const firstStarted = new Promise<void>((r) => (started = r));
    const order: string[] = [];
    await enqueueReportBuild(q, randomUUID());
    await enqueueReportBuild(q, randomUUID());
    const options = jobRunnerOptions(url, {
      [BUILD_REPORT_TASK]: async () => {
        order.push("report started");
        started();
        // Held until the e-mail has gone (or 20 s): were reports allowed into the e-mail slots,
        // two of them would fill both and the e-mail would wait for this.
        await Promise.race([released, new Promise((r) => setTimeout(r, 20_000))]);
        order.push("report finished");
      },
      send_email: async () => {
        order.push("email sent");
        release();
      },
    });
    const runners = await Promise.all(options.map((o) => run({ ...o, pollInterval: 200 })));
    try {
      await firstStarted;
      await q.transaction((trx) => enqueueEmail(resetMail("second@jobs.test"), trx));
      await released;
      await expect.poll(() => order.filter((o) => o === "report finished").length, { timeout: 30_000 }).toBe(2);
    } finally {
      await Promise.all(runners.map((r) => r.stop()));
    }
    // One report at a time, and the e-mail in between.
    expect(order).toEqual(["report started", "email sent", "report finished", "report started", "report finished"]);
  });
});

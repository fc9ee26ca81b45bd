// Report builds never delay e-mail: on a queue of its own (a scratch database, so no app's worker
// takes these jobs), e-mail jobs carry a higher priority than report jobs, which run one at a time
// in their own named queue. The real graphile-worker decides the order.
import { randomUUID } from "node:crypto";
import knexFactory, { type Knex } from "knex";
import { run, runMigrations, runOnce } from "graphile-worker";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { enqueueEmail, openEmailJob } from "@/server/jobs/enqueue-email";
import { REPORT_QUEUE } from "@/server/jobs/job-priorities";
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

const silent = { logger: undefined };

describe("e-mail jobs and report jobs", () => {
  test("are queued with e-mail ahead: report jobs in their own named queue at a lower priority", async () => {
    await enqueueReportBuild(q, randomUUID());
    await q.transaction((trx) => enqueueEmail(resetMail("first@jobs.test"), trx));
    const { rows } = await q.raw(
      `SELECT t.identifier, j.priority, jq.queue_name FROM graphile_worker._private_jobs j
         JOIN graphile_worker._private_tasks t ON t.id = j.task_id
         LEFT JOIN graphile_worker._private_job_queues jq ON jq.id = j.job_queue_id`,
    );
    const report = rows.find((r: { identifier: string }) => r.identifier === BUILD_REPORT_TASK);
    const email = rows.find((r: { identifier: string }) => r.identifier === "send_email");
    expect(report.queue_name).toBe(REPORT_QUEUE);
    expect(email.queue_name).toBeNull();
    expect(email.priority).toBeLessThan(report.priority);

    // The worker takes the e-mail first, though the report was queued before it.
    const order: string[] = [];
    await runOnce({ connectionString: url, concurrency: 1, ...silent, taskList: { [BUILD_REPORT_TASK]: async () => void order.push("report"), send_email: async (p) => void order.push(`email to ${openEmailJob(p).to}`) } });
    expect(order).toEqual(["email to first@jobs.test", "report"]);
  });

  test("while a report builds, a second report waits in its queue and an e-mail takes the free slot", async () => {
    let release!: () => void;
    const released = new Promise<void>((r) => (release = r));
    let started!: () => void;
    const firstStarted = new Promise<void>((r) => (started = r));
    const order: string[] = [];
    await enqueueReportBuild(q, randomUUID());
    await enqueueReportBuild(q, randomUUID());
    const runner = await run({
      connectionString: url,
      concurrency: 2,
      pollInterval: 200,
      noHandleSignals: true,
      taskList: {
        [BUILD_REPORT_TASK]: async () => {
          order.push("report started");
          started();
          // Held until the e-mail has gone (or 20 s): a worker that let two reports fill both
          // slots would send the e-mail only after this.
          await Promise.race([released, new Promise((r) => setTimeout(r, 20_000))]);
          order.push("report finished");
        },
        send_email: async () => {
          order.push("email sent");
          release();
        },
      },
    });
    try {
      await firstStarted;
      await q.transaction((trx) => enqueueEmail(resetMail("second@jobs.test"), trx));
      await released;
      await expect.poll(() => order.filter((o) => o === "report finished").length, { timeout: 30_000 }).toBe(2);
    } finally {
      await runner.stop();
    }
    expect(order.slice(0, 2)).toEqual(["report started", "email sent"]);
  });
});

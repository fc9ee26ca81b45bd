// E-mail goes through the job queue in PostgreSQL: while the mail server is down the message
// waits and is retried, and it arrives once the server is back. Nothing is lost.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startBuiltApp } from "../support/built-app";
import { closeTestDb, testDb } from "../support/db";
import { freePort, linkIn, startSmtpSink, type SmtpSink } from "../support/smtp-sink";

let app: Awaited<ReturnType<typeof startBuiltApp>>;
let sink: SmtpSink | undefined;
let port: number;
const email = `patient-${process.pid}-${Date.now()}@retry.test`;

beforeAll(async () => {
  port = await freePort();
  // The app sends to a port where, for now, nothing listens.
  process.env.SMTP_URL = `smtp://127.0.0.1:${port}?ignoreTLS=true`;
  app = await startBuiltApp();
  expect((await request(app.server).post("/api/sign-up").send({ firmName: "Patient Partners", name: "Pat", email, password: "patient-password" })).status).toBe(201);
});
afterAll(async () => {
  await app?.close();
  await sink?.close();
  await closeTestDb();
});

const jobFor = async () => {
  // The public jobs view leaves out the payload; graphile-worker 0.17 keeps it in _private_jobs.
  const { rows } = await testDb().raw(
    `SELECT j.attempts, j.last_error FROM graphile_worker._private_jobs j JOIN graphile_worker._private_tasks t ON t.id = j.task_id
      WHERE t.identifier = 'send_email' AND j.payload->>'to' = ? AND j.payload->>'kind' = 'password_reset'`,
    [email],
  );
  return rows[0] as { attempts: number; last_error: string | null } | undefined;
};

describe("mail server down, then up", () => {
  test("the reset e-mail fails, stays queued, and is delivered by a retry once the server answers", async () => {
    expect((await request(app.server).post("/api/password-resets").send({ email })).status).toBe(202);
    await expect.poll(async () => (await jobFor())?.attempts ?? 0, { timeout: 15_000 }).toBeGreaterThanOrEqual(1);
    expect((await jobFor())?.last_error).toMatch(/ECONNREFUSED/);

    sink = await startSmtpSink(port);
    // The sign-up's address confirmation is queued too; the reset is the one followed here.
    await expect.poll(() => sink!.messages.find((m) => m.subject === "Choose a new Filmsheet password"), { timeout: 30_000 }).toBeDefined();
    const mail = sink.messages.find((m) => m.subject === "Choose a new Filmsheet password")!;
    expect(linkIn(mail, "/reset-password/")).toMatch(/^\/reset-password\/[A-Za-z0-9_-]{43}$/);
    // Delivered jobs leave the queue.
    await expect.poll(jobFor, { timeout: 5000 }).toBeUndefined();
  });
});

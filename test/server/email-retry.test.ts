// E-mail goes through the job queue in PostgreSQL: while the mail server is down the message
// waits and is retried, and it arrives once the server is back. Nothing is lost, nothing is sent
// twice. MAIL_DOWN_SECONDS (default 4) sets how long the server stays down in the second test:
// MAIL_DOWN_SECONDS=60 is the minute-long outage of docs/scaling.md (the retry pauses grow as
// e^attempts seconds, so the last messages then arrive up to about half a minute after it ends).
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startBuiltApp } from "../support/built-app";
import { closeTestDb, testDb } from "../support/db";
import { freePort, linkIn, startSmtpSink, type SmtpSink } from "../support/smtp-sink";

let app: Awaited<ReturnType<typeof startBuiltApp>>;
let sink: SmtpSink | undefined;
let port: number;
const email = `patient-${process.pid}-${Date.now()}@retry.test`;
const others = [1, 2, 3].map((n) => `queued${n}-${process.pid}-${Date.now()}@retry.test`);
const DOWN_MS = Number(process.env.MAIL_DOWN_SECONDS ?? 4) * 1000;

beforeAll(async () => {
  port = await freePort();
  // The app sends to a port where, for now, nothing listens.
  process.env.SMTP_URL = `smtp://127.0.0.1:${port}?ignoreTLS=true`;
  app = await startBuiltApp();
  for (const [i, to] of [email, ...others].entries()) {
    expect((await request(app.server).post("/api/sign-up").send({ firmName: `Patient Partners ${i}`, name: "Pat", email: to, password: "patient-password" })).status).toBe(201);
  }
});
afterAll(async () => {
  await app?.close();
  await sink?.close();
  await closeTestDb();
});

const jobFor = async (to = email) => {
  // The public jobs view leaves out the payload; graphile-worker 0.17 keeps it in _private_jobs.
  const { rows } = await testDb().raw(
    `SELECT j.attempts, j.last_error FROM graphile_worker._private_jobs j JOIN graphile_worker._private_tasks t ON t.id = j.task_id
      WHERE t.identifier = 'send_email' AND j.payload->>'to' = ? AND j.payload->>'kind' = 'password_reset'`,
    [to],
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

describe("mail server down for a while, with several messages queued", () => {
  test("every queued message is delivered once it returns, and none twice", async () => {
    await sink!.close();
    sink = undefined;
    const downSince = Date.now();
    for (const to of others) expect((await request(app.server).post("/api/password-resets").send({ email: to })).status).toBe(202);
    // Each has failed at least once against the closed port.
    for (const to of others) await expect.poll(async () => (await jobFor(to))?.attempts ?? 0, { timeout: 20_000 }).toBeGreaterThanOrEqual(1);
    await new Promise((r) => setTimeout(r, Math.max(0, DOWN_MS - (Date.now() - downSince))));

    sink = await startSmtpSink(port);
    for (const to of others) await sink.waitFor(to, 120_000);
    for (const to of others) await expect.poll(() => jobFor(to), { timeout: 5000 }).toBeUndefined();
    // Time for a duplicate to turn up, had a job been run twice.
    await new Promise((r) => setTimeout(r, 3000));
    // Sign-up queued an address confirmation to each as well; the resets are the ones counted.
    const count = (to: string) => sink!.messages.filter((m) => m.subject === "Choose a new Filmsheet password" && JSON.stringify(m.to).includes(to)).length;
    expect(others.map(count)).toEqual([1, 1, 1]);
  }, 240_000);
});

// Two app instances as separate processes (`next start` of the build, JOBS_WORKER=off), one job
// worker process and nginx in front, sharing the test database: whichever instance answers, the
// session, the sign-in limit, the job queue and the report download are the same.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { closeTestDb, testDb } from "../support/db";
import { nginxMissing, startDeployment, type Deployment } from "../support/instances";
import { sessionCookie, signInWithPassword } from "../support/sessions";
import { startSmtpSink, type SmtpSink } from "../support/smtp-sink";

const missing = nginxMissing();
if (missing) console.warn(`multi-instance tests skipped: nginx is not installed and could not be (${missing})`);

const run = `${process.pid}-${Date.now()}`;
const password = "two-instances-password";
let d: Deployment;
let sink: SmtpSink;
let a: string;
let b: string;

beforeAll(async () => {
  if (missing) return;
  sink = await startSmtpSink();
  d = await startDeployment(2, {
    DATABASE_URL: process.env.DATABASE_URL!,
    AUTH_SECRET: process.env.AUTH_SECRET!,
    SMTP_URL: sink.url,
    DEMO_PASSWORD: process.env.DEMO_PASSWORD || "filmsheet-demo",
  });
  [a, b] = d.instances as [string, string];
}, 180_000);
afterAll(async () => {
  await d?.stop();
  await sink?.close();
  await closeTestDb();
});

describe.skipIf(Boolean(missing))("two instances behind nginx", () => {
  test("the balancer spreads requests over both instances, and each answers for itself", async () => {
    for (const base of [a, b, d.balancer]) expect((await request(base).get("/api/health")).body).toEqual({ status: "ok", db: "ok" });
  });

  test("a session made on instance A is honoured by instance B and through the balancer", async () => {
    const cookie = await sessionCookie(a, "consultant@demo.filmsheet.test", process.env.DEMO_PASSWORD || "filmsheet-demo");
    for (const base of [b, d.balancer, d.balancer]) {
      const me = await request(base).get("/api/me").set("cookie", cookie);
      expect(me.status).toBe(200);
      expect(me.body.user.email).toBe("consultant@demo.filmsheet.test");
    }
    // And no instance accepts it without the cookie.
    expect((await request(b).get("/api/me")).status).toBe(401);
  });

  test("the sign-in limit is shared: failures on A and B together lock the account on both", async () => {
    const email = `two-${run}@instances.test`;
    expect((await request(d.balancer).post("/api/sign-up").send({ firmName: "Two Instance Partners", name: "Tia", email, password })).status).toBe(201);
    for (let i = 1; i <= 5; i++) {
      // Alternate instances: neither has seen five failures on its own.
      const r = await signInWithPassword(i % 2 ? a : b, email, `wrong-${i}`, `10.9.0.${i}`);
      expect(r.code).toBe("invalid");
    }
    for (const base of [a, b, d.balancer]) {
      const locked = await signInWithPassword(base, email, password, "10.9.1.1");
      expect([locked.cookie, locked.code]).toEqual([undefined, "rate_limited"]);
    }
  });

  test("an e-mail queued by instance B is sent once, by the worker process", async () => {
    const email = `reset-${run}@instances.test`;
    expect((await request(a).post("/api/sign-up").send({ firmName: "Reset Partners", name: "Rex", email, password })).status).toBe(201);
    expect((await request(b).post("/api/password-resets").send({ email })).status).toBe(202);
    // Sign-up queued an address confirmation too; the reset is the message followed here.
    const isReset = (m: (typeof sink.messages)[number]) => JSON.stringify(m.to).includes(email) && m.subject === "Choose a new Filmsheet password";
    await expect.poll(() => sink.messages.some(isReset), { timeout: 30_000 }).toBe(true);
    const mail = sink.messages.find(isReset)!;
    // Two web instances and a worker are running; give a second delivery time to show up.
    await new Promise((r) => setTimeout(r, 3000));
    const to = (m: (typeof sink.messages)[number]) => JSON.stringify(m.to).includes(email);
    expect(sink.messages.filter((m) => to(m) && m.subject === mail.subject)).toHaveLength(1);
  });

  test("a report queued on A is built by the worker and downloads from B and through the balancer", async () => {
    const cookie = await sessionCookie(d.balancer, "consultant@demo.filmsheet.test", process.env.DEMO_PASSWORD || "filmsheet-demo");
    const project = await testDb()("projects").where({ reference: "TS-2417" }).first("id");
    const queued = await request(a).post(`/api/projects/${project.id}/reports`).set({ cookie, origin: a }).send({ kind: "draft" });
    expect(queued.status, JSON.stringify(queued.body)).toBe(202);
    let build: { status: string; download: string | null; byte_size: number } = queued.body;
    const deadline = Date.now() + 90_000;
    while (build.status !== "done" && build.status !== "failed" && Date.now() < deadline) {
      await new Promise((r) => setTimeout(r, 250));
      build = (await request(b).get(`/api/projects/${project.id}/reports/${queued.body.id}`).set("cookie", cookie)).body;
    }
    expect(build.status).toBe("done");
    for (const base of [b, d.balancer]) {
      const pdf = await request(base).get(build.download!).set("cookie", cookie).buffer(true).parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on("data", (c: Buffer) => chunks.push(c));
        res.on("end", () => done(null, Buffer.concat(chunks)));
      });
      expect(pdf.status).toBe(200);
      expect((pdf.body as Buffer).length).toBe(build.byte_size);
    }
    // The job ran once and left the queue.
    const left = await testDb().raw(
      `SELECT count(*)::int AS n FROM graphile_worker._private_jobs j JOIN graphile_worker._private_tasks t ON t.id = j.task_id
        WHERE t.identifier = 'build_report' AND j.payload->>'buildId' = ?`,
      [queued.body.id],
    );
    expect(left.rows[0].n).toBe(0);
  });
});

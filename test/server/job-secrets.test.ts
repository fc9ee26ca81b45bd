// Sign-in links, password resets and invitations are never stored in clear in the job queue:
// with the mail server down, each e-mail waits (and fails) in graphile-worker's tables, and no
// row there holds its link or token — only a sealed payload that the app alone can open.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { openEmailJob } from "@/server/jobs/enqueue-email";
import { startBuiltApp } from "../support/built-app";
import { closeTestDb, testDb } from "../support/db";
import { cookieHeader, sessionCookie } from "../support/sessions";
import { freePort } from "../support/smtp-sink";

let app: Awaited<ReturnType<typeof startBuiltApp>>;
const run = `${process.pid}-${Date.now()}`;
const founder = { firmName: "Sealed Ducts", name: "Sol Sealer", email: `sol-${run}@sealed.test`, password: "sealed-password-1" };
const invited = `ivo-${run}@sealed.test`;
const api = () => request(app.server);

beforeAll(async () => {
  // Nothing listens there: every e-mail stays in the queue, retried and failing.
  process.env.SMTP_URL = `smtp://127.0.0.1:${await freePort()}?ignoreTLS=true`;
  app = await startBuiltApp();
  expect((await api().post("/api/sign-up").send(founder)).status).toBe(201);
});
afterAll(async () => {
  await app?.close();
  await closeTestDb();
});

/** Every stored column of the e-mail jobs to an address, as text, with the job's attempts. */
async function jobsTo(email: string): Promise<{ row: string; payload: unknown }[]> {
  const { rows } = await testDb().raw(
    `SELECT row_to_json(j)::text AS row, j.payload FROM graphile_worker._private_jobs j JOIN graphile_worker._private_tasks t ON t.id = j.task_id
      WHERE t.identifier = 'send_email' AND j.payload->>'to' = ?`,
    [email],
  );
  return rows;
}

const SECRETS = [/https?:\/\//, /\/reset-password\//, /\/invitations\//, /\/confirm-email\//, /callback\/nodemailer/, /token=/];

describe("e-mails that carry a secret link", () => {
  test("are queued sealed: the job rows hold no link, and the app opens them to the full message", async () => {
    const { port } = app.server.address() as { port: number };
    const cookie = await sessionCookie(app.server, founder.email, founder.password);
    expect((await api().post("/api/password-resets").send({ email: founder.email })).status).toBe(202);
    const csrf = await api().get("/api/auth/csrf");
    const link = await api().post("/api/auth/signin/nodemailer").set("cookie", cookieHeader(csrf.headers["set-cookie"])).type("form").send({ email: founder.email, csrfToken: csrf.body.csrfToken, callbackUrl: "/projects" });
    expect(link.status).toBe(302);
    const invite = await api().post("/api/firm/invitations").set({ cookie, origin: `http://127.0.0.1:${port}` }).send({ email: invited, roles: ["viewer"] });
    expect(invite.status, invite.text).toBe(201);

    const jobs = [...(await jobsTo(founder.email)), ...(await jobsTo(invited))];
    const kinds = jobs.map((j) => openEmailJob(j.payload).kind).sort();
    // The sign-up queued the address confirmation; the rest were asked for above.
    expect(kinds).toEqual(["email_confirmation", "invitation", "magic_link", "password_reset"]);
    for (const job of jobs) {
      for (const secret of SECRETS) expect(job.row).not.toMatch(secret);
      // Opened by the app (the worker does this just before sending), the link is all there.
      expect(openEmailJob(job.payload).text).toMatch(/https?:\/\/\S+\/(reset-password\/|invitations\/|confirm-email\/|api\/auth\/callback\/nodemailer\?)/);
    }

    // After a failed attempt (the job keeps its error and payload for the retry), still nothing in clear.
    await expect.poll(async () => Math.min(...(await jobsTo(founder.email)).map((j) => JSON.parse(j.row).attempts as number)), { timeout: 20_000 }).toBeGreaterThanOrEqual(1);
    for (const job of await jobsTo(founder.email)) for (const secret of SECRETS) expect(job.row).not.toMatch(secret);
  });
});

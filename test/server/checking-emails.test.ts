// The checking e-mails through the job queue to a real SMTP sink: check requested (to checkers),
// row queried (to the row's last editor), query answered (to the checker who queried), revision
// issued (to the project's people) — and nothing to whoever muted the project.
import type { ParsedMail } from "mailparser";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { grantPaidPlan } from "../support/billing";
import { startBuiltApp } from "../support/built-app";
import { acceptAll, dropLeftoverEmailJobs, makeMember } from "../support/checking";
import { closeTestDb, testDb } from "../support/db";
import { makeProject, type FixtureProject } from "../support/schedule-fixtures";
import { sessionCookie } from "../support/sessions";
import { linkIn, startSmtpSink, type SmtpSink } from "../support/smtp-sink";

const PASSWORD = process.env.DEMO_PASSWORD || "filmsheet-demo";
const SLUG = `quillon-air-${process.pid}`;
type Who = "consultant" | "checker" | "muted_checker" | "viewer" | "admin";
let app: Awaited<ReturnType<typeof startBuiltApp>>;
let sink: SmtpSink;
let fx: FixtureProject;
const people = {} as Record<Who, { id: number; email: string; headers: Record<string, string> }>;

/** Every e-mail queued for these people has been sent: none is left in the queue. */
async function queueDrained(timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  // Other test files leave undeliverable jobs of their own in the shared queue: count only ours.
  const ours = Object.values(people).map((p) => p.email);
  for (;;) {
    const { rows } = await testDb().raw(
      "SELECT count(*)::int AS n FROM graphile_worker._private_jobs j JOIN graphile_worker._private_tasks t ON t.id = j.task_id WHERE t.identifier = 'send_email' AND j.payload->>'to' = ANY(?)",
      [ours],
    );
    if (rows[0].n === 0) return;
    if (Date.now() > deadline) throw new Error(`${rows[0].n} e-mail jobs still queued`);
    await new Promise((r) => setTimeout(r, 200));
  }
}
const mailTo = (who: Who, kind: string): ParsedMail[] => sink.messages.filter((m) => m.headers.get("x-filmsheet-kind") === kind && JSON.stringify(m.to).includes(people[who].email));

beforeAll(async () => {
  await dropLeftoverEmailJobs(testDb());
  sink = await startSmtpSink();
  process.env.SMTP_URL = sink.url; // this file's worker process only
  app = await startBuiltApp();
  const origin = `http://127.0.0.1:${(app.server.address() as { port: number }).port}`;
  // A firm of its own (invented), so that only these people can receive anything.
  const [firm] = await testDb()("firms").insert({ name: "Quillon Air Design", slug: SLUG }).returning("id");
  await grantPaidPlan(firm.id);
  const roles: Record<Who, ("consultant" | "checker" | "viewer" | "admin")[]> = { consultant: ["consultant"], checker: ["checker"], muted_checker: ["checker"], viewer: ["viewer"], admin: ["admin"] };
  for (const who of Object.keys(roles) as Who[]) {
    const m = await makeMember(SLUG, roles[who], `Quillon ${who.replace("_", " ")}`);
    people[who] = { ...m, headers: { cookie: await sessionCookie(app.server, m.email, PASSWORD), origin } };
  }
  fx = await makeProject(SLUG);
});

afterAll(async () => {
  await app?.close();
  await sink?.close();
  await closeTestDb();
});

const api = (who: Who, method: "get" | "post" | "put" | "patch", path: string, body?: object) => {
  const req = request(app.server)[method](path).set(people[who].headers);
  return body === undefined ? req : req.send(body);
};

describe("checking e-mails, each to the right people", () => {
  test("a checker mutes the project; the setting reads back", async () => {
    const res = await api("muted_checker", "put", `/api/projects/${fx.projectId}/notifications`, { muted: true });
    expect(res.status, res.text).toBe(200);
    expect((await api("muted_checker", "get", `/api/projects/${fx.projectId}/notifications`)).body).toEqual({ muted: true });
    expect((await api("checker", "get", `/api/projects/${fx.projectId}/notifications`)).body).toEqual({ muted: false });
  });

  test("check requested → the checkers who have not muted the project", async () => {
    expect((await api("consultant", "patch", `/api/projects/${fx.projectId}/surfaces/${fx.surfaceIds[0]}`, { version: 1, area_m2: 13.5 })).status).toBe(200);
    const res = await api("consultant", "post", `/api/projects/${fx.projectId}/check-requests`, { message: "Schedule complete for stage 3" });
    expect(res.status, res.text).toBe(201);
    expect(res.body).toEqual({ counts: { rows: 5, unchecked: 5, accepted: 0, queried: 0 }, notified: 1 });
    const mail = await sink.waitFor(people.checker.email, 60_000);
    expect(mail.subject).toBe(`Check requested: ${await reference()} Fixture pavilion`);
    expect(mail.text).toContain("“Schedule complete for stage 3”");
    expect(mail.text).toContain("5 rows, of which 5 unchecked and 0 queried");
    expect(linkIn(mail, "/projects/")).toBe(`/projects/${fx.projectId}/check`);
  });

  test("row queried → the row's last editor, with the query and a link to the row", async () => {
    const res = await api("checker", "post", `/api/projects/${fx.projectId}/surfaces/${fx.surfaceIds[0]}/check`, { move: "query", row_version: 2, comment: "Centroid height 3 m on a 6 m wall?" });
    expect(res.status, res.text).toBe(200);
    const mail = await sink.waitFor(people.consultant.email, 60_000);
    expect(mail.headers.get("x-filmsheet-kind")).toBe("row_queried");
    expect(mail.subject).toMatch(/^Query on Surface South wall/);
    expect(mail.text).toContain("“Centroid height 3 m on a 6 m wall?”");
    expect(linkIn(mail, "/projects/")).toBe(`/projects/${fx.projectId}/surfaces/${fx.surfaceIds[0]}`);
  });

  test("query answered → the checker who queried", async () => {
    const res = await api("consultant", "post", `/api/projects/${fx.projectId}/surfaces/${fx.surfaceIds[0]}/comments`, { body: "Ground-floor panel only: 3 m is right" });
    expect(res.status, res.text).toBe(201);
    expect(res.body.kind).toBe("answer");
    await waitUntil(() => mailTo("checker", "query_answered").length === 1);
    expect(mailTo("checker", "query_answered")[0]!.text).toContain("“Ground-floor panel only: 3 m is right”");
  });

  test("revision issued → consultant, other checkers and viewers; not the issuer, not the muted", async () => {
    const checkerRow = await testDb()("users").where({ email: people.checker.email }).first("id");
    await acceptAll(fx.projectId, checkerRow.id);
    const res = await api("checker", "post", `/api/projects/${fx.projectId}/revisions`, { note: "Stage 3 issue" });
    expect(res.status, res.text).toBe(201);
    await waitUntil(() => mailTo("viewer", "revision_issued").length === 1 && mailTo("consultant", "revision_issued").length === 1);
    const mail = mailTo("viewer", "revision_issued")[0]!;
    expect(mail.subject).toBe(`Revision A issued: ${await reference()} Fixture pavilion`);
    expect(mail.text).toContain("with all 5 rows checked and accepted");
    expect(mail.text).toContain("competent, licensed engineer");
    expect(linkIn(mail, "/projects/")).toBe(`/projects/${fx.projectId}/revisions/A`);
  });

  test("after the queue is empty: nothing reached the muted checker, the issuer's own actions or the admin", async () => {
    await queueDrained();
    expect(sink.messages.filter((m) => JSON.stringify(m.to).includes(people.muted_checker.email))).toEqual([]);
    expect(mailTo("checker", "revision_issued")).toEqual([]);
    expect(mailTo("consultant", "check_requested")).toEqual([]);
    expect(sink.messages.filter((m) => JSON.stringify(m.to).includes(people.admin.email))).toEqual([]);
    // Each person got each e-mail once. (The queue is shared: jobs other test files left behind
    // may be delivered here too, so only this firm's people are counted.)
    const ours = Object.values(people).map((p) => p.email);
    const kinds = sink.messages.filter((m) => ours.some((e) => JSON.stringify(m.to).includes(e))).map((m) => `${m.headers.get("x-filmsheet-kind")} ${(m.to as { text: string }).text}`).sort();
    expect(kinds).toEqual(
      [
        `check_requested ${people.checker.email}`,
        `query_answered ${people.checker.email}`,
        `revision_issued ${people.consultant.email}`,
        `revision_issued ${people.viewer.email}`,
        `row_queried ${people.consultant.email}`,
      ].sort(),
    );
  });
});

async function reference(): Promise<string> {
  return (await testDb()("projects").where({ id: fx.projectId }).first("reference")).reference;
}

async function waitUntil(ok: () => boolean, timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!ok()) {
    if (Date.now() > deadline) throw new Error(`Timed out; e-mails so far: ${sink.messages.map((m) => m.subject).join(" | ")}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

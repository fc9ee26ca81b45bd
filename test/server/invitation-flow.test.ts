// Sign up → invite a colleague → the invitation e-mail, read from a real SMTP sink → accept →
// sign in; and the rules around it: seats, resend, revoke, roles, the last admin, removal.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startBuiltApp } from "../support/built-app";
import { closeTestDb, testDb } from "../support/db";
import { sessionCookie, signInWithPassword } from "../support/sessions";
import { linkIn, startSmtpSink, type SmtpSink } from "../support/smtp-sink";

let app: Awaited<ReturnType<typeof startBuiltApp>>;
let sink: SmtpSink;
const run = `${process.pid}-${Date.now()}`;
const founder = { firmName: "Harrowgate Thermal Partners", name: "Wen Harrow", email: `wen-${run}@harrowgate.test`, password: "founder-password-1" };
const colleague = `colleague-${run}@harrowgate.test`;
let admin: string; // the founder's session cookie
let origin: string;

const api = () => request(app.server);
const asAdmin = <T extends request.Test>(r: T) => r.set("cookie", admin).set("origin", origin);

beforeAll(async () => {
  sink = await startSmtpSink();
  process.env.SMTP_URL = sink.url; // this file's worker process only
  app = await startBuiltApp();
  origin = `http://127.0.0.1:${(app.server.address() as { port: number }).port}`;
});
afterAll(async () => {
  await app?.close();
  await sink?.close();
  await closeTestDb();
});

describe("a new firm invites a colleague who joins it", () => {
  let invitationLink: string;

  test("sign-up creates the firm and makes its creator admin", async () => {
    const res = await api().post("/api/sign-up").send(founder);
    expect(res.status, res.text).toBe(201);
    expect(res.body.firm.name).toBe(founder.firmName);
    admin = await sessionCookie(app.server, founder.email, founder.password);
    const me = await api().get("/api/me").set("cookie", admin);
    expect(me.body).toMatchObject({ via: "session", firm: { name: founder.firmName }, user: { email: founder.email } });
    expect(me.body.roles).toContain("admin");
  });

  test("signing up twice with one address is refused, naming the field", async () => {
    const res = await api().post("/api/sign-up").send({ ...founder, email: founder.email.toUpperCase() });
    expect(res.status).toBe(409);
    expect(res.body.error.details).toEqual([{ field: "email", message: "Already has an account" }]);
  });

  test("the admin invites a colleague as checker and the e-mail arrives with a working link", async () => {
    const res = await asAdmin(api().post("/api/firm/invitations")).send({ email: colleague, roles: ["checker"] });
    expect(res.status, res.text).toBe(201);
    const mail = await sink.waitFor(colleague);
    expect(mail.subject).toBe(`Wen Harrow invited you to ${founder.firmName} on Filmsheet`);
    expect(mail.text).toContain("as checker");
    expect(mail.html).toContain("Accept the invitation");
    invitationLink = linkIn(mail, "/invitations/");
    const page = await api().get(invitationLink);
    expect(page.status).toBe(200);
    expect(page.text).toContain(`Join ${founder.firmName}`);
  });

  test("accepting creates the account and the membership; the colleague then signs in", async () => {
    const token = invitationLink.split("/").at(-1);
    const missing = await api().post("/api/invitations/accept").send({ token });
    expect(missing.status).toBe(422);
    expect(missing.body.error.details.map((d: { field: string }) => d.field)).toEqual(["name", "password"]);

    const res = await api().post("/api/invitations/accept").send({ token, name: "Kit Colleague", password: "colleague-password" });
    expect(res.status, res.text).toBe(200);
    expect(res.body).toMatchObject({ accountCreated: true, roles: ["checker"], firm: { name: founder.firmName } });

    const cookie = await sessionCookie(app.server, colleague, "colleague-password");
    const me = await api().get("/api/me").set("cookie", cookie);
    expect(me.body).toMatchObject({ firm: { name: founder.firmName }, roles: ["checker"] });
    // A checker is a member, not an admin.
    expect((await api().get("/api/firm/members").set("cookie", cookie)).status).toBe(403);
    const again = await api().post("/api/invitations/accept").send({ token, name: "Kit", password: "colleague-password" });
    expect(again.status).toBe(410);
  });

  test("someone who already has an account (in another firm) accepts with their own password", async () => {
    const existing = "admin@other.filmsheet.test";
    expect((await asAdmin(api().post("/api/firm/invitations")).send({ email: existing, roles: ["viewer"] })).status).toBe(201);
    const token = linkIn(await sink.waitFor(existing), "/invitations/").split("/").at(-1);
    const wrong = await api().post("/api/invitations/accept").send({ token, password: "not-their-password" });
    expect(wrong.status).toBe(403);
    expect(wrong.body.error.details).toEqual([{ field: "password", message: "Wrong password" }]);
    const res = await api().post("/api/invitations/accept").send({ token, password: process.env.DEMO_PASSWORD || "filmsheet-demo" });
    expect(res.status, res.text).toBe(200);
    expect(res.body).toMatchObject({ accountCreated: false, roles: ["viewer"], firm: { name: founder.firmName } });
    // Their own firm is untouched; here they are a viewer. Removed again to keep the seat count below.
    const { members } = (await asAdmin(api().get("/api/firm/members"))).body;
    const row = members.find((m: { email: string }) => m.email === existing);
    expect(row.roles).toEqual(["viewer"]);
    expect((await asAdmin(api().delete(`/api/firm/members/${row.id}`))).status).toBe(200);
    expect(await testDb()("memberships as m").join("firms as f", "f.id", "m.firm_id").where({ "m.user_id": row.id }).pluck("f.slug")).toEqual(["ostrander-mechanical"]);
  });

  test("the members list shows both, with their roles and the seats in use", async () => {
    const res = await asAdmin(api().get("/api/firm/members"));
    expect(res.body.members.map((m: { email: string; roles: string[] }) => [m.email, m.roles])).toEqual([
      [colleague, ["checker"]],
      [founder.email, ["admin", "consultant"]],
    ]);
    expect(res.body.seats).toEqual({ bought: 5, members: 2, pending: 0, used: 2 });
  });
});

describe("a person in two firms", () => {
  test("works in the firm the firm cookie names, if they belong to it; otherwise in their first firm", async () => {
    const user = await testDb()("users").where({ email: colleague }).first("id");
    const demo = await testDb()("firms").where({ slug: "tarnbrook-sill" }).first("id", "name");
    const other = await testDb()("firms").where({ slug: "ostrander-mechanical" }).first("id");
    await testDb()("memberships").insert({ firm_id: demo.id, user_id: user.id, role: "viewer" });
    const cookie = await sessionCookie(app.server, colleague, "colleague-password");
    const asIn = (firmId?: string) => api().get("/api/me").set("cookie", firmId ? `${cookie}; filmsheet-firm=${firmId}` : cookie);
    expect((await asIn()).body.firm.name).toBe(founder.firmName); // first by name
    expect((await asIn(demo.id)).body).toMatchObject({ firm: { name: demo.name }, roles: ["viewer"] });
    // A firm they do not belong to cannot be chosen: the cookie is ignored.
    expect((await asIn(other.id)).body.firm.name).toBe(founder.firmName);
    await testDb()("memberships").where({ firm_id: demo.id, user_id: user.id }).delete();
  });
});

describe("seats, resend, revoke and roles", () => {
  const invite = (email: string) => asAdmin(api().post("/api/firm/invitations")).send({ email, roles: ["viewer"] });

  test("inviting beyond the seats bought is refused with a clear message", async () => {
    for (const n of [1, 2, 3]) expect((await invite(`extra${n}-${run}@harrowgate.test`)).status).toBe(201);
    const over = await invite(`one-too-many-${run}@harrowgate.test`);
    expect(over.status).toBe(409);
    expect(over.body.error.message).toBe(
      "All 5 seats are in use (2 members, 3 pending invitations). Buy more seats, or revoke a pending invitation or remove a member, before inviting someone else.",
    );
  });

  test("resending gives a new link (the old one stops working); revoking frees the seat and kills the link", async () => {
    const email = `extra1-${run}@harrowgate.test`;
    const firstLink = linkIn(await sink.waitFor(email), "/invitations/");
    const { invitations } = (await asAdmin(api().get("/api/firm/invitations"))).body;
    const inv = invitations.find((i: { email: string }) => i.email === email);
    const resent = await asAdmin(api().post(`/api/firm/invitations/${inv.id}/resend`));
    expect(resent.body.send_count).toBe(2);
    await expect.poll(() => sink.messages.filter((m) => m.text?.includes(email) || JSON.stringify(m.to).includes(email)).length, { timeout: 20_000 }).toBe(2);
    const token = firstLink.split("/").at(-1);
    expect((await api().post("/api/invitations/accept").send({ token, name: "X", password: "some-password-1" })).status).toBe(404);

    expect((await asAdmin(api().delete(`/api/firm/invitations/${inv.id}`))).status).toBe(200);
    expect((await asAdmin(api().delete(`/api/firm/invitations/${inv.id}`))).status).toBe(404);
    expect((await invite(`after-revoke-${run}@harrowgate.test`)).status).toBe(201);
  });

  test("an expired invitation cannot be accepted", async () => {
    const email = `extra2-${run}@harrowgate.test`;
    const token = linkIn(await sink.waitFor(email), "/invitations/").split("/").at(-1);
    await testDb()("invitations").where({ email }).update({ expires_at: new Date(Date.now() - 1000) });
    const res = await api().post("/api/invitations/accept").send({ token, name: "Late", password: "late-password-1" });
    expect(res.status).toBe(410);
    expect(res.body.error.message).toContain("expired");
  });

  test("the last admin can neither lose the role nor be removed; another admin makes it possible", async () => {
    const { members } = (await asAdmin(api().get("/api/firm/members"))).body;
    const me = members.find((m: { email: string }) => m.email === founder.email);
    const other = members.find((m: { email: string }) => m.email === colleague);
    const demote = await asAdmin(api().patch(`/api/firm/members/${me.id}`)).send({ roles: ["consultant"] });
    expect(demote.status).toBe(409);
    expect(demote.body.error.message).toContain("last admin");
    expect((await asAdmin(api().delete(`/api/firm/members/${me.id}`))).status).toBe(409);

    expect((await asAdmin(api().patch(`/api/firm/members/${other.id}`)).send({ roles: ["admin", "checker"] })).status).toBe(200);
    expect((await asAdmin(api().patch(`/api/firm/members/${me.id}`)).send({ roles: ["consultant"] })).body.roles).toEqual(["consultant"]);
  });

  test("a removed member loses access at once", async () => {
    const cookie = await sessionCookie(app.server, colleague, "colleague-password");
    const { members } = (await api().get("/api/firm/members").set("cookie", cookie)).body;
    const founderRow = members.find((m: { email: string }) => m.email === founder.email);
    expect((await api().delete(`/api/firm/members/${founderRow.id}`).set("cookie", cookie).set("origin", origin)).status).toBe(200);
    const after = await api().get("/api/me").set("cookie", admin);
    expect(after.status).toBe(403);
    expect(after.body.error.message).toContain("not a member of any firm");
    // Still able to sign in (the account remains), but with no firm to act for.
    expect((await signInWithPassword(app.server, founder.email, founder.password)).cookie).toBeDefined();
  });
});

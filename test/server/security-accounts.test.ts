// Issue 12, accounts: a removed member loses what they set up, sign-out ends the session on the
// server, a sign-up's address is confirmed by link from the account's own session, a stranger's
// pre-registered password does not survive the owner's first link sign-in, and sign-in links
// are limited. Real PostgreSQL, the built app in-process, a real SMTP sink.
import bcrypt from "bcryptjs";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startBuiltApp } from "../support/built-app";
import { closeTestDb, testDb } from "../support/db";
import { cookieHeader, sessionCookie, signInWithPassword } from "../support/sessions";
import { linkIn, startSmtpSink, type SmtpSink } from "../support/smtp-sink";

let app: Awaited<ReturnType<typeof startBuiltApp>>;
let sink: SmtpSink;
let origin: string;
const run = `${process.pid}-${Date.now()}`;
const api = () => request(app.server);
const me = (cookie: string) => api().get("/api/me").set("cookie", cookie);
const with_ = <T extends request.Test>(r: T, cookie: string) => r.set("cookie", cookie).set("origin", origin);

/** A firm of its own through the public sign-up; its founder (admin) signed in. */
async function newFirm(tag: string) {
  const founder = { firmName: `Accounts ${tag} Partners`, name: `Founder ${tag}`, email: `founder-${tag}-${run}@accounts.test`, password: "founder-password-1" };
  const res = await api().post("/api/sign-up").send(founder);
  expect(res.status, res.text).toBe(201);
  return { firmId: res.body.firm.id as string, founder, cookie: await sessionCookie(app.server, founder.email, founder.password) };
}

/** A verified person added straight to a firm with these roles (as an accepted invitation leaves them). */
async function addPerson(firmId: string, tag: string, roles: string[]) {
  const email = `${tag}-${run}@accounts.test`;
  const password = `${tag}-password-1`;
  const [user] = await testDb()("users").insert({ email, name: `Person ${tag}`, password_hash: await bcrypt.hash(password, 4), emailVerified: new Date() }).returning(["id"]);
  await testDb()("memberships").insert(roles.map((role) => ({ firm_id: firmId, user_id: user.id, role })));
  return { id: user.id as number, email, password, name: `Person ${tag}`, cookie: await sessionCookie(app.server, email, password) };
}

/** Signs out as the header's sign-out button does through Auth.js (CSRF token and all). */
async function signOut(cookie: string) {
  const csrf = await api().get("/api/auth/csrf").set("cookie", cookie);
  const jar = cookieHeader(csrf.headers["set-cookie"], cookie);
  const res = await api().post("/api/auth/signout").set("cookie", jar).type("form").send({ csrfToken: csrf.body.csrfToken, callbackUrl: "/sign-in" });
  expect(res.status).toBe(302);
  return res;
}

/** Asks for a sign-in link as the sign-in form does, from `address` (the proxy's hop). */
async function askForLink(email: string, address: string) {
  const csrf = await api().get("/api/auth/csrf");
  return api()
    .post("/api/auth/signin/nodemailer")
    .set("cookie", cookieHeader(csrf.headers["set-cookie"]))
    .set("x-forwarded-for", address)
    .type("form")
    .send({ email, csrfToken: csrf.body.csrfToken, callbackUrl: "/projects" });
}

/** The first message to `to` with this subject, waiting for it. */
async function mailTo(to: string, subject: string) {
  await expect.poll(() => mailsTo(to).find((m) => m.subject === subject), { timeout: 20_000 }).toBeDefined();
  return mailsTo(to).find((m) => m.subject === subject)!;
}
const SIGN_IN_LINK = "Your Filmsheet sign-in link";
const CONFIRM = "Confirm your e-mail address for Filmsheet";
const mailsTo = (to: string) => sink.messages.filter((m) => (Array.isArray(m.to) ? m.to : [m.to]).some((a) => a?.text.toLowerCase().includes(to)));

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

describe("a removed member loses what they set up", () => {
  test("their API tokens are revoked and their open invitations withdrawn, in the removal itself", async () => {
    const { firmId, cookie: founder } = await newFirm("removal");
    const leaver = await addPerson(firmId, "leaver", ["admin"]);
    const made = await with_(api().post("/api/firm/tokens"), leaver.cookie).send({ name: "leaver's script", role: "consultant", expiresInDays: 30 });
    expect(made.status, made.text).toBe(201);
    expect(made.body.token.created_by).toMatchObject({ id: leaver.id, email: leaver.email });
    const secret = made.body.secret as string;
    const invited = await with_(api().post("/api/firm/invitations"), leaver.cookie).send({ email: `friend-${run}@accounts.test`, roles: ["viewer"] });
    expect(invited.status, invited.text).toBe(201);
    // The founder's own token and invitation are not the leaver's: they stay.
    const kept = await with_(api().post("/api/firm/tokens"), founder).send({ name: "founder's script", role: "viewer", expiresInDays: 30 });
    const keptInvite = await with_(api().post("/api/firm/invitations"), founder).send({ email: `other-${run}@accounts.test`, roles: ["viewer"] });
    expect((await api().get("/api/me").set("authorization", `Bearer ${secret}`)).status).toBe(200);

    const removed = await with_(api().delete(`/api/firm/members/${leaver.id}`), founder);
    expect(removed.status, removed.text).toBe(200);
    expect(removed.body).toEqual({ id: leaver.id, removed: true, tokensRevoked: 1, invitationsRevoked: 1 });

    const refused = await api().get("/api/me").set("authorization", `Bearer ${secret}`);
    expect(refused.status).toBe(401);
    expect(refused.body.error.message).toMatch(/revoked/);
    expect((await api().get("/api/me").set("authorization", `Bearer ${kept.body.secret}`)).status).toBe(200);
    const invitations = await testDb()("invitations").where({ firm_id: firmId }).select("id", "revoked_at");
    expect(invitations.find((i) => i.id === invited.body.id)?.revoked_at).not.toBeNull();
    expect(invitations.find((i) => i.id === keptInvite.body.id)?.revoked_at).toBeNull();
    expect((await with_(api().get("/api/firm/invitations"), founder)).body.invitations.map((i: { id: string }) => i.id)).toEqual([keptInvite.body.id]);
  });

  test("the token lists, API and page, say who made each token", async () => {
    const { cookie: founder, founder: who } = await newFirm("lists");
    expect((await with_(api().post("/api/firm/tokens"), founder).send({ name: "nightly export", role: "viewer", expiresInDays: 7 })).status).toBe(201);
    const list = await api().get("/api/firm/tokens").set("cookie", founder);
    expect(list.status).toBe(200);
    expect(list.body.tokens).toHaveLength(1);
    expect(list.body.tokens[0].created_by).toMatchObject({ name: who.name, email: who.email });
    const page = await api().get("/firm/tokens").set("cookie", founder);
    expect(page.status).toBe(200);
    expect(page.text).toContain("Made by");
    expect(page.text).toContain(who.name);
  });

  test("an API token cannot make tokens, invite admins or make anyone admin (403); a person can", async () => {
    const { firmId, cookie: founder } = await newFirm("tokens");
    const token = await with_(api().post("/api/firm/tokens"), founder).send({ name: "admin script", role: "admin", expiresInDays: 7 });
    const bearer = { authorization: `Bearer ${token.body.secret}` };
    const mint = await api().post("/api/firm/tokens").set(bearer).send({ name: "child", role: "admin", expiresInDays: 365 });
    expect(mint.status).toBe(403);
    expect(mint.body.error.code).toBe("forbidden");
    const adminInvite = await api().post("/api/firm/invitations").set(bearer).send({ email: `boss-${run}@accounts.test`, roles: ["admin"] });
    expect(adminInvite.status).toBe(403);
    expect(adminInvite.body.error.details).toEqual([{ field: "roles", message: "Not with an API token" }]);
    expect((await api().post("/api/firm/invitations").set(bearer).send({ email: `reader-${run}@accounts.test`, roles: ["viewer"] })).status).toBe(201);
    const member = await addPerson(firmId, "promoted", ["viewer"]);
    expect((await api().patch(`/api/firm/members/${member.id}`).set(bearer).send({ roles: ["admin"] })).status).toBe(403);
    expect((await api().patch(`/api/firm/members/${member.id}`).set(bearer).send({ roles: ["checker"] })).status).toBe(200);
    expect(await testDb()("api_tokens").where({ firm_id: firmId }).count({ n: "*" }).first()).toEqual({ n: "1" });
    expect(await testDb()("invitations").where({ firm_id: firmId, email: `boss-${run}@accounts.test` }).first()).toBeUndefined();
  });
});

describe("signing out ends the session on the server", () => {
  test("a copied session cookie stops working once its browser signs out; other sessions go on", async () => {
    const { founder } = await newFirm("signout");
    const laptop = await sessionCookie(app.server, founder.email, founder.password);
    const phone = await sessionCookie(app.server, founder.email, founder.password);
    const copied = laptop; // e.g. lifted from the laptop's browser profile
    expect((await me(copied)).status).toBe(200);
    await signOut(laptop);
    expect((await me(copied)).status).toBe(401);
    expect((await api().get("/projects").set("cookie", copied)).headers.location ?? "").toMatch(/\/sign-in/);
    expect((await me(phone)).status).toBe(200);
  });

  test("sign out everywhere: every other session of the person stops working, theirs only", async () => {
    const { founder, cookie: first } = await newFirm("everywhere");
    const second = await sessionCookie(app.server, founder.email, founder.password);
    const third = await sessionCookie(app.server, founder.email, founder.password);
    const someoneElse = await newFirm("bystander");
    const res = await with_(api().delete("/api/me/sessions"), third);
    expect(res.status, res.text).toBe(200);
    expect(res.body).toEqual({ revoked: 2 });
    expect((await me(first)).status).toBe(401);
    expect((await me(second)).status).toBe(401);
    expect((await me(third)).status).toBe(200);
    expect((await me(someoneElse.cookie)).status).toBe(200);
    // The account page offers it (its button also ends the session it is pressed in).
    const page = await api().get("/account").set("cookie", third);
    expect(page.status).toBe(200);
    expect(page.text).toContain("Sign out everywhere");
  });

  test("a session cookie made before session rows existed (no session id) is refused", async () => {
    const { founder } = await newFirm("legacy");
    const cookie = await sessionCookie(app.server, founder.email, founder.password);
    await testDb()("user_sessions").whereIn("user_id", testDb()("users").select("id").where({ email: founder.email })).delete();
    expect((await me(cookie)).status).toBe(401);
  });
});

describe("an address nobody proved", () => {
  test("a stranger pre-registers someone's address: the owner's first link sign-in ends the stranger's password and sessions", async () => {
    const owner = `owner-${run}@accounts.test`;
    const stranger = { firmName: "Squatter Holdings", name: "Not The Owner", email: owner, password: "stranger-password-1" };
    expect((await api().post("/api/sign-up").send(stranger)).status).toBe(201);
    const strangerSession = await sessionCookie(app.server, owner, stranger.password);
    expect((await me(strangerSession)).status).toBe(200);

    // The owner signs in with an e-mailed link: the mailbox is theirs.
    expect((await askForLink(owner, "10.77.0.1")).status).toBe(302);
    const link = linkIn(await mailTo(owner, SIGN_IN_LINK), "/api/auth/callback/nodemailer");
    const follow = await api().get(link);
    const ownerSession = cookieHeader(follow.headers["set-cookie"]);
    expect(ownerSession).toMatch(/authjs\.session-token=/);
    expect((await me(ownerSession)).status).toBe(200);

    // Refused: the stranger's password and the stranger's session.
    const retry = await signInWithPassword(app.server, owner, stranger.password, "10.77.0.2");
    expect([retry.cookie, retry.code]).toEqual([undefined, "invalid"]);
    expect((await me(strangerSession)).status).toBe(401);
    const row = await testDb()("users").where({ email: owner }).first("password_hash", "emailVerified");
    expect(row.password_hash).toBeNull();
    expect(row.emailVerified).not.toBeNull();

    // Recovered: the owner chooses a password by the reset link and signs in with it.
    expect((await api().post("/api/password-resets").send({ email: owner })).status).toBe(202);
    const token = linkIn(await mailTo(owner, "Choose a new Filmsheet password"), "/reset-password/").split("/").at(-1);
    expect((await api().post("/api/password-resets/confirm").send({ token, password: "owner-password-22" })).status).toBe(200);
    expect((await signInWithPassword(app.server, owner, "owner-password-22", "10.77.0.3")).cookie).toBeDefined();
  });

  test("the sign-up e-mail's link confirms the address, from a session of that account only", async () => {
    const { founder, cookie } = await newFirm("confirm");
    const token = linkIn(await mailTo(founder.email, CONFIRM), "/confirm-email/").split("/").at(-1)!;
    // Following the link signed out leads to sign-in first (the mailbox alone is not enough).
    const page = await api().get(`/confirm-email/${token}`);
    expect(page.status).toBe(307);
    expect(page.headers.location).toContain(`/sign-in?callbackUrl=${encodeURIComponent(`/confirm-email/${token}`)}`);
    expect((await api().post("/api/me/email-confirmations").send({ token })).status).toBe(401);
    const other = await newFirm("confirm-other");
    const wrong = await with_(api().post("/api/me/email-confirmations"), other.cookie).send({ token });
    expect(wrong.status).toBe(403);
    expect((await with_(api().get("/account"), cookie)).text).toContain("not confirmed yet");

    const ok = await with_(api().post("/api/me/email-confirmations"), cookie).send({ token });
    expect(ok.status, ok.text).toBe(200);
    expect(ok.body).toEqual({ email: founder.email, confirmed: true });
    expect((await with_(api().post("/api/me/email-confirmations"), cookie).send({ token })).status).toBe(410);
    expect((await testDb()("users").where({ email: other.founder.email }).first("emailVerified")).emailVerified).toBeNull();

    // Confirmed: a later sign-in by link leaves the password alone.
    expect((await askForLink(founder.email, "10.77.2.1")).status).toBe(302);
    const follow = await api().get(linkIn(await mailTo(founder.email, SIGN_IN_LINK), "/api/auth/callback/nodemailer"));
    expect((await me(cookieHeader(follow.headers["set-cookie"]))).status).toBe(200);
    expect((await signInWithPassword(app.server, founder.email, founder.password, "10.77.2.2")).cookie).toBeDefined();
  });

  test("a proven address keeps its password when its owner signs in by link", async () => {
    const { firmId } = await newFirm("proven");
    const person = await addPerson(firmId, "proven-person", ["viewer"]);
    expect((await askForLink(person.email, "10.77.1.1")).status).toBe(302);
    const follow = await api().get(linkIn(await mailTo(person.email, SIGN_IN_LINK), "/api/auth/callback/nodemailer"));
    expect((await me(cookieHeader(follow.headers["set-cookie"]))).status).toBe(200);
    expect((await signInWithPassword(app.server, person.email, person.password, "10.77.1.2")).cookie).toBeDefined();
    expect((await me(person.cookie)).status).toBe(200);
  });
});

describe("sign-in links are limited", () => {
  test("at most 5 links an hour go to one address, however many places ask", async () => {
    const { firmId } = await newFirm("links");
    const target = await addPerson(firmId, "link-target", ["viewer"]);
    for (let i = 1; i <= 8; i++) {
      const res = await askForLink(target.email, `10.78.${i}.1`);
      // The answer never changes: nothing tells the asker the limit was reached.
      expect([res.status, res.headers.location]).toEqual([302, expect.stringContaining("/verify-request")]);
    }
    await expect.poll(() => mailsTo(target.email).length, { timeout: 20_000 }).toBe(5);
    await new Promise((r) => setTimeout(r, 2500)); // the queue has had time to send any more
    expect(mailsTo(target.email)).toHaveLength(5);
  });

  test("one place may ask for at most 20 links an hour, for any addresses", async () => {
    const { firmId } = await newFirm("place");
    const target = await addPerson(firmId, "place-target", ["viewer"]);
    const place = `10.79.${process.pid % 250}.9`;
    for (let i = 0; i < 20; i++) expect((await askForLink(`nobody${i}-${run}@accounts.test`, place)).status).toBe(302);
    expect((await askForLink(target.email, place)).status).toBe(302);
    await new Promise((r) => setTimeout(r, 3000));
    expect(mailsTo(target.email)).toHaveLength(0);
    // From elsewhere the same address gets its link.
    expect((await askForLink(target.email, "10.79.250.1")).status).toBe(302);
    await mailTo(target.email, SIGN_IN_LINK);
  });
});

// Magic-link sign-in and password reset, each read from a real SMTP sink and followed as a
// person would follow the link.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startBuiltApp } from "../support/built-app";
import { closeTestDb, testDb } from "../support/db";
import { cookieHeader, sessionCookie, signInWithPassword } from "../support/sessions";
import { linkIn, startSmtpSink, type SmtpSink } from "../support/smtp-sink";

let app: Awaited<ReturnType<typeof startBuiltApp>>;
let sink: SmtpSink;
const run = `${process.pid}-${Date.now()}`;
const person = { firmName: "Kestrel Duct Design", name: "Ola Kestrel", email: `ola-${run}@kestrel.test`, password: "first-password-1" };
const api = () => request(app.server);
const origin = () => `http://127.0.0.1:${(app.server.address() as { port: number }).port}`;

beforeAll(async () => {
  sink = await startSmtpSink();
  process.env.SMTP_URL = sink.url;
  app = await startBuiltApp();
  expect((await api().post("/api/sign-up").send(person)).status).toBe(201);
  // Ola confirms the address as the sign-up e-mail asks (signed in), so a sign-in link later
  // leaves the password alone (an unconfirmed account would lose it: security-accounts.test.ts).
  const confirm = linkIn(await sink.waitFor(person.email), "/confirm-email/").split("/").at(-1);
  const cookie = await sessionCookie(app.server, person.email, person.password);
  expect((await api().post("/api/me/email-confirmations").set("cookie", cookie).set("origin", origin()).send({ token: confirm })).status).toBe(200);
});
afterAll(async () => {
  await app?.close();
  await sink?.close();
  await closeTestDb();
});

/** Asks Auth.js for a magic link exactly as the sign-in form's post does. */
async function askForLink(email: string) {
  const csrf = await api().get("/api/auth/csrf");
  return api().post("/api/auth/signin/nodemailer").set("cookie", cookieHeader(csrf.headers["set-cookie"])).type("form").send({ email, csrfToken: csrf.body.csrfToken, callbackUrl: "/projects" });
}

describe("magic link", () => {
  let link: string;

  test("asking for a link sends an e-mail whose link signs in", async () => {
    const res = await askForLink(person.email.toUpperCase());
    expect(res.status).toBe(302);
    expect(res.headers.location).toContain("/verify-request");
    await expect.poll(() => sink.messages.find((m) => m.subject === "Your Filmsheet sign-in link"), { timeout: 20_000 }).toBeDefined();
    const mail = sink.messages.find((m) => m.subject === "Your Filmsheet sign-in link")!;
    link = linkIn(mail, "/api/auth/callback/nodemailer");
    const follow = await api().get(link);
    expect(follow.status).toBe(302);
    const cookie = cookieHeader(follow.headers["set-cookie"]);
    expect(cookie).toMatch(/authjs\.session-token=/);
    const me = await api().get("/api/me").set("cookie", cookie);
    expect(me.status).toBe(200);
    expect(me.body).toMatchObject({ user: { email: person.email }, firm: { name: person.firmName } });
  });

  test("the link works once", async () => {
    const again = await api().get(link);
    expect(again.headers.location).toContain("error=Verification");
    expect(String(again.headers["set-cookie"] ?? "")).not.toMatch(/session-token=[^;]/);
  });

  test("an address without an account gets the same answer and no e-mail, and no account is made", async () => {
    const stranger = `stranger-${run}@kestrel.test`;
    const res = await askForLink(stranger);
    expect(res.status).toBe(302);
    expect(res.headers.location).toContain("/verify-request");
    await expect(sink.waitFor(stranger, 3000)).rejects.toThrow(/No e-mail/);
    expect(await testDb()("users").where({ email: stranger }).first()).toBeUndefined();
  });
});

describe("password reset", () => {
  test("the e-mailed link sets a new password, signs out old sessions and works once", async () => {
    const oldSession = await sessionCookie(app.server, person.email, person.password);
    expect((await api().get("/api/me").set("cookie", oldSession)).status).toBe(200);

    const ask = await api().post("/api/password-resets").send({ email: person.email });
    expect(ask.status).toBe(202);
    await expect.poll(() => sink.messages.find((m) => m.subject === "Choose a new Filmsheet password"), { timeout: 20_000 }).toBeDefined();
    const mail = sink.messages.find((m) => m.subject === "Choose a new Filmsheet password");
    const token = linkIn(mail!, "/reset-password/").split("/").at(-1);

    const weak = await api().post("/api/password-resets/confirm").send({ token, password: "short" });
    expect(weak.status).toBe(422);
    expect(weak.body.error.details[0].field).toBe("body.password");

    // Sessions are compared to the reset to the second: let one tick pass.
    await new Promise((r) => setTimeout(r, 1100));
    const done = await api().post("/api/password-resets/confirm").send({ token, password: "second-password-2" });
    expect(done.status, done.text).toBe(200);

    expect((await api().get("/api/me").set("cookie", oldSession)).status).toBe(401);
    expect((await signInWithPassword(app.server, person.email, person.password, "10.9.0.1")).cookie).toBeUndefined();
    expect((await signInWithPassword(app.server, person.email, "second-password-2", "10.9.0.1")).cookie).toBeDefined();
    expect((await api().post("/api/password-resets/confirm").send({ token, password: "third-password-3" })).status).toBe(410);
  });

  test("an unknown address gets the same answer and no e-mail", async () => {
    const stranger = `nobody-${run}@kestrel.test`;
    const res = await api().post("/api/password-resets").send({ email: stranger });
    expect(res.status).toBe(202);
    expect(res.body).toEqual({ sent: true });
    await expect(sink.waitFor(stranger, 3000)).rejects.toThrow(/No e-mail/);
  });
});

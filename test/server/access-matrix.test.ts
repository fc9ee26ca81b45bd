// Every route handler in app/api × every kind of caller → the expected status, against the built
// app and the real database. The list of routes comes from the files on disk, so a new route
// (or a new method on one) without an entry in access-matrix/entries.ts fails here.
import { readdirSync, readFileSync } from "node:fs";
import { join, relative } from "node:path";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { clearPlan, connectWebhooks, startTestStandIn } from "../support/billing";
import { startBuiltApp } from "../support/built-app";
import { closeTestDb, testDb } from "../support/db";
import { ROOT } from "../support/paths";
import { sessionCookie } from "../support/sessions";
import { bearer, makeToken } from "../support/tokens";
import { ENTRIES, PRINCIPALS, type MatrixEntry, type Principal } from "./access-matrix/entries";
import { DEMO_FIRM, OTHER_FIRM, firmId } from "./access-matrix/fixtures";

const API = join(ROOT, "app/api");
const PASSWORD = process.env.DEMO_PASSWORD || "filmsheet-demo";

function routeFiles(dir = API): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? routeFiles(join(dir, e.name)) : e.name === "route.ts" ? [relative(API, join(dir, e.name))] : [],
  );
}

/** Every (file, method) a route file exports, read from its source. */
const exported = routeFiles().flatMap((file) =>
  [...readFileSync(join(API, file), "utf8").matchAll(/export const (GET|POST|PUT|PATCH|DELETE)\b/g)].map((m) => `${m[1]} ${file}`),
);

describe("the matrix covers every route handler", () => {
  test("each exported handler in app/api/**/route.ts has exactly one entry, and each entry a handler", () => {
    const listed = ENTRIES.map((e) => `${e.method} ${e.file}`);
    expect(new Set(listed).size, "duplicate entries").toBe(listed.length);
    expect([...listed].sort()).toEqual([...exported].sort());
  });
});

let app: Awaited<ReturnType<typeof startBuiltApp>>;
let stripe: Awaited<ReturnType<typeof startTestStandIn>>;
let origin: string;
const headers = {} as Record<Principal, Record<string, string>>;
let seats: { id: string; seats: number }[] = [];

beforeAll(async () => {
  // The billing routes talk to Stripe: a stand-in of this file's own.
  stripe = await startTestStandIn();
  app = await startBuiltApp();
  const { port } = app.server.address() as { port: number };
  origin = `http://127.0.0.1:${port}`;
  connectWebhooks(stripe, origin);
  // Room for the invitations and members the cells create; restored afterwards.
  seats = await testDb()("firms").whereIn("slug", [DEMO_FIRM, OTHER_FIRM]).select("id", "seats");
  await testDb()("firms").whereIn("slug", [DEMO_FIRM, OTHER_FIRM]).update({ seats: 10_000 });
  const session = async (email: string) => ({ cookie: await sessionCookie(app.server, email, PASSWORD), origin });
  headers.anonymous = {};
  headers.admin = await session("admin@demo.filmsheet.test");
  headers.consultant = await session("consultant@demo.filmsheet.test");
  headers.checker = await session("checker@demo.filmsheet.test");
  headers.viewer = await session("viewer@demo.filmsheet.test");
  headers.other_firm = await session("admin@other.filmsheet.test");
  headers.admin_token = bearer(await makeToken(DEMO_FIRM, "admin"));
  headers.revoked_token = bearer(await makeToken(DEMO_FIRM, "admin", "revoked"));
  headers.expired_token = bearer(await makeToken(DEMO_FIRM, "admin", "expired"));
});

afterAll(async () => {
  for (const f of seats) await testDb()("firms").where({ id: f.id }).update({ seats: f.seats });
  // Entries that needed a paid plan or made a Stripe customer leave the demo firms as they were: free.
  for (const slug of [DEMO_FIRM, OTHER_FIRM]) await clearPlan(await firmId(slug));
  await app?.close();
  await stripe?.close();
  await closeTestDb();
});

const cells = ENTRIES.flatMap((entry) => PRINCIPALS.map((principal) => [`${entry.method} ${entry.file}`, principal, entry.expect[principal], entry] as const));

describe("status by route and caller", () => {
  test.each(cells)("%s as %s → %i", async (_label, principal, status, entry: MatrixEntry) => {
    const { path, body, form, raw } = await entry.request();
    let req = request(app.server)[entry.method.toLowerCase() as "get" | "post" | "patch" | "put" | "delete"](path).set(headers[principal]);
    if (body !== undefined) req = req.send(body as object);
    if (form !== undefined) req = req.type("form").send(form);
    if (raw !== undefined) req = req.set("content-type", raw.type).send(raw.data);
    const res = await req;
    // Binary answers (the report PDF) have no text.
    expect(res.status, `${entry.method} ${path}: ${(res.text ?? "").slice(0, 300)}`).toBe(status);
    if (principal === "other_firm" && status < 300) entry.isolation?.(res.body);
  });
});

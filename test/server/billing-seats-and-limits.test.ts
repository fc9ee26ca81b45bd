// Seats against members in use, seat changes on the subscription, bad input, and the paid-tier
// check itself (assertPlanAllows) on the real database.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { StandIn } from "../../scripts/stripe-stand-in";
import { clearPlan, connectWebhooks, grantPaidPlan, newFirmAdmin, startTestStandIn } from "../support/billing";
import { startBuiltApp } from "../support/built-app";
import { closeTestDb, testDb } from "../support/db";
import { assertPlanAllows } from "@/server/services/assert-plan-allows";
import { createProject } from "@/server/services/create-project";
import { getPlan } from "@/server/services/get-plan";
import type { Actor } from "@/server/auth/actor";

let app: Awaited<ReturnType<typeof startBuiltApp>>;
let standIn: StandIn;
let origin: string;

beforeAll(async () => {
  standIn = await startTestStandIn();
  app = await startBuiltApp();
  origin = `http://127.0.0.1:${(app.server.address() as { port: number }).port}`;
  connectWebhooks(standIn, origin);
});
afterAll(async () => {
  await app?.close();
  await standIn?.close();
  await closeTestDb();
});

const api = () => request(app.server);
const invite = (headers: Record<string, string>, who: string) => api().post("/api/firm/invitations").set(headers).send({ email: `${who}-${Date.now()}@billing.filmsheet.test`, roles: ["viewer"] });

describe("seats below the seats in use are refused", () => {
  test("Checkout for fewer seats than members and pending invitations is refused naming the field; no session is made", async () => {
    const firm = await newFirmAdmin(app.server, origin);
    expect((await invite(firm.headers, "ivy")).status).toBe(201);
    expect((await invite(firm.headers, "oren")).status).toBe(201);
    const sessions = Object.keys(standIn.store.state.checkoutSessions).length;
    const res = await api().post("/api/firm/billing/checkout").set(firm.headers).send({ seats: 2 });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toBe("2 seats would not cover the 3 in use (1 member, 2 pending invitations). Choose at least 3, or remove members or revoke invitations first.");
    expect(res.body.error.details).toEqual([{ field: "seats", message: "At least 3 (seats in use)" }]);
    expect(Object.keys(standIn.store.state.checkoutSessions)).toHaveLength(sessions);
    expect((await api().post("/api/firm/billing/checkout").set(firm.headers).send({ seats: 3 })).status).toBe(201);
  });

  test("a paid firm changes its seats on the subscription, never below the seats in use", async () => {
    const firm = await newFirmAdmin(app.server, origin);
    const checkout = await api().post("/api/firm/billing/checkout").set(firm.headers).send({ seats: 2 });
    const done = await (await fetch(`${standIn.url}/_stand-in/checkout/sessions/${checkout.body.sessionId}/complete`, { method: "POST" })).json();
    expect((await invite(firm.headers, "uma")).status).toBe(201);

    const refused = await api().put("/api/firm/billing/seats").set(firm.headers).send({ seats: 1 });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/^1 seat would not cover the 2 in use/);
    expect(standIn.store.state.subscriptions[done.session.subscription]!.items).toMatchObject({ data: [{ quantity: 2 }] });

    const changed = await api().put("/api/firm/billing/seats").set(firm.headers).send({ seats: 6 });
    expect(changed.status, changed.text).toBe(200);
    expect(changed.body).toEqual({ seats: 6 });
    await standIn.flush();
    expect(standIn.store.state.subscriptions[done.session.subscription]!.items).toMatchObject({ data: [{ quantity: 6 }] });
    expect(await testDb()("firms").where({ id: firm.firmId }).first("seats")).toEqual({ seats: 6 });
    const overview = await api().get("/api/firm/billing").set(firm.headers);
    expect(overview.body.nextInvoice.amountDue).toBe(6 * 2900);
  });

  test.each([
    ["zero", 0, "Buy at least 1 seat"],
    ["a fraction", 2.5, "Seats must be a whole number"],
    ["too many", 501, "At most 500 seats can be bought here"],
    ["text", "many", "Seats must be a whole number"],
  ])("%s seats are refused with 422 naming the field", async (_label, seats, message) => {
    const firm = await newFirmAdmin(app.server, origin);
    const res = await api().post("/api/firm/billing/checkout").set(firm.headers).send({ seats });
    expect(res.status).toBe(422);
    expect(res.body.error.details).toEqual([{ field: "body.seats", message }]);
    expect(await testDb()("firm_billing").where({ firm_id: firm.firmId }).first()).toBeUndefined();
  });
});

describe("assertPlanAllows", () => {
  let firmId: string;
  beforeAll(async () => {
    firmId = (await newFirmAdmin(app.server, origin)).firmId;
  });
  const check = (needs: Parameters<typeof assertPlanAllows>[2]) => testDb().transaction((trx) => assertPlanAllows(trx, firmId, needs));

  test.each([
    ["40 rows", { rows: 40 }, null],
    ["41 rows", { rows: 41 }, /free plan holds 40 rows per project \(this change would make 41\)/],
    ["one project", { projects: 1 }, null],
    ["two projects", { projects: 2 }, /free plan holds 1 project/],
    ["a revision", { revisions: true as const }, /Issuing revisions needs a paid plan/],
    ["a clean report", { cleanReport: true as const }, /without the “not for issue” mark need a paid plan/],
  ])("a free firm: %s", async (_label, needs, refusal) => {
    if (refusal === null) await expect(check(needs)).resolves.toMatchObject({ plan: "free" });
    else await expect(check(needs)).rejects.toMatchObject({ code: "plan_limit", status: 402, message: expect.stringMatching(refusal) });
  });

  test("a paid firm may do everything, and a counting function is not even called", async () => {
    await grantPaidPlan(firmId, 3);
    let counted = false;
    const plan = await check({ projects: 99, rows: async () => ((counted = true), 10_000), revisions: true, cleanReport: true });
    expect(plan).toMatchObject({ plan: "paid", limits: { projects: null, rowsPerProject: null, revisions: true, cleanReport: true } });
    expect(counted).toBe(false);
    await clearPlan(firmId);
    expect((await getPlan(firmId)).plan).toBe("free");
  });

  test("two projects created at once by a free firm: exactly one is saved", async () => {
    const firm = await testDb()("firms").where({ id: firmId }).first("id", "name");
    const actor = { via: "session", userId: null, name: null, email: null, firm, roles: ["consultant"], firms: [firm], tokenId: null } as Actor;
    const results = await Promise.allSettled(["RACE-1", "RACE-2"].map((reference) => createProject(actor, { name: "Race", reference })));
    expect(results.map((r) => r.status).sort()).toEqual(["fulfilled", "rejected"]);
    expect((results.find((r) => r.status === "rejected") as PromiseRejectedResult).reason).toMatchObject({ code: "plan_limit" });
    expect(await testDb()("projects").where({ firm_id: firmId }).count({ n: "*" }).then((r) => Number(r[0]!.n))).toBe(1);
  });
});

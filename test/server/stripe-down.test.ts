// The Stripe stand-in down: the billing page and API say so and still show the plan from our own
// tables; buying refuses with 503 naming Stripe; everything that does not need Stripe works.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { newFirmAdmin } from "../support/billing";
import { startBuiltApp } from "../support/built-app";
import { closeTestDb } from "../support/db";
import { freeTcpPort } from "../support/instances";

let app: Awaited<ReturnType<typeof startBuiltApp>>;
let admin: Awaited<ReturnType<typeof newFirmAdmin>>;

beforeAll(async () => {
  // Nothing listens here: every Stripe call is refused, as when Stripe (or the stand-in) is down.
  process.env.STRIPE_API_URL = `http://127.0.0.1:${await freeTcpPort()}`;
  app = await startBuiltApp();
  const { port } = app.server.address() as { port: number };
  admin = await newFirmAdmin(app.server, `http://127.0.0.1:${port}`);
});
afterAll(async () => {
  await app?.close();
  await closeTestDb();
});

describe("Stripe down", () => {
  test("the billing page says Stripe did not answer, and still shows the plan and seats", async () => {
    const page = await request(app.server).get("/firm/billing").set(admin.headers);
    expect(page.status).toBe(200);
    expect(page.text).toContain("Stripe did not answer just now");
    const api = await request(app.server).get("/api/firm/billing").set(admin.headers);
    expect(api.status).toBe(200);
    expect(api.body.plan.plan).toBe("free");
    expect(api.body.stripeProblem).toMatch(/Stripe did not answer/);
    expect([api.body.price, api.body.invoices]).toEqual([null, []]);
  });

  test("checkout is refused with 503 naming Stripe, not a 500", async () => {
    const res = await request(app.server).post("/api/firm/billing/checkout").set(admin.headers).send({ seats: 5 });
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe("unavailable");
    expect(res.body.error.message).toMatch(/Stripe/);
  });

  test("nothing else breaks: projects are listed and created", async () => {
    expect((await request(app.server).get("/projects").set(admin.headers)).status).toBe(200);
    const created = await request(app.server).post("/api/projects").set(admin.headers).send({ name: "Works without Stripe", reference: "NS-1" });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    expect((await request(app.server).get(`/api/projects/${created.body.id}`).set(admin.headers)).status).toBe(200);
  });
});

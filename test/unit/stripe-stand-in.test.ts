// The local Stripe stand-in answers its health call and Stripe-shaped errors for anything else.
import type { AddressInfo } from "node:net";
import { afterAll, beforeAll, expect, test } from "vitest";
import { startStripeStandIn } from "../../scripts/stripe-stand-in";

let base: string;
let close: () => Promise<void>;

beforeAll(async () => {
  const server = await startStripeStandIn(0);
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  close = () => new Promise((resolve) => server.close(() => resolve()));
});
afterAll(() => close?.());

test("GET /health answers ok", async () => {
  const res = await fetch(`${base}/health`);
  expect(res.status).toBe(200);
  expect(await res.json()).toEqual({ status: "ok", service: "stripe-stand-in" });
});

test("an unknown call answers 404 with a Stripe-shaped error", async () => {
  const res = await fetch(`${base}/v1/customers`, { method: "POST" });
  expect(res.status).toBe(404);
  expect((await res.json()).error.type).toBe("invalid_request_error");
});

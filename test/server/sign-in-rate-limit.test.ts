// Password sign-in limits, kept in PostgreSQL: per account (5 failures in 15 min) and per
// address (20 failures in 15 min). They trip, hold even for the right password, and recover
// once the failures are older than the window (aged here in the database instead of waiting).
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startBuiltApp } from "../support/built-app";
import { closeTestDb, testDb } from "../support/db";
import { signInWithPassword } from "../support/sessions";
import request from "supertest";

let app: Awaited<ReturnType<typeof startBuiltApp>>;
const run = `${process.pid}-${Date.now()}`;
const password = "correct-horse-staple";
const accounts = [0, 1].map((n) => `limit${n}-${run}@ratelimit.test`);

/** Moves every attempt of this run 16 minutes into the past: as if the window had passed. */
const age = (column: "email" | "address", value: string) =>
  testDb()("sign_in_attempts").where(column, value).update({ created_at: testDb().raw("created_at - interval '16 minutes'") });

beforeAll(async () => {
  app = await startBuiltApp();
  for (const [i, email] of accounts.entries()) {
    expect((await request(app.server).post("/api/sign-up").send({ firmName: `Limit Firm ${i}`, name: "Lim", email, password })).status).toBe(201);
  }
});
afterAll(async () => {
  await app?.close();
  await closeTestDb();
});

describe("per account", () => {
  const [email] = accounts as [string];

  test("five wrong passwords lock the account, from any address, even with the right password", async () => {
    for (let i = 1; i <= 5; i++) {
      const r = await signInWithPassword(app.server, email, `wrong-${i}`, `10.1.0.${i}`);
      expect([r.cookie, r.code]).toEqual([undefined, "invalid"]);
    }
    const locked = await signInWithPassword(app.server, email, password, "10.1.0.99");
    expect(locked.cookie).toBeUndefined();
    expect(locked.code).toBe("rate_limited");
    const rows = await testDb()("sign_in_attempts").where({ email }).select("outcome").orderBy("id");
    expect(rows.map((r) => r.outcome)).toEqual(["failed", "failed", "failed", "failed", "failed", "blocked"]);
  });

  test("it recovers when the failures leave the 15-minute window", async () => {
    await age("email", email);
    const r = await signInWithPassword(app.server, email, password, "10.1.0.99");
    expect(r.cookie).toBeDefined();
  });

  test("a success resets the count: four more failures do not lock", async () => {
    for (let i = 1; i <= 4; i++) expect((await signInWithPassword(app.server, email, `again-${i}`, "10.1.1.1")).code).toBe("invalid");
    expect((await signInWithPassword(app.server, email, password, "10.1.1.1")).cookie).toBeDefined();
  });
});

describe("per address", () => {
  const address = `10.2.${process.pid % 250}.7`;
  const [, email] = accounts as [string, string];

  test("twenty failures from one address block it, for every account; other addresses are not affected", async () => {
    for (let i = 0; i < 20; i++) {
      // Spread over many accounts (none of them locked on its own).
      expect((await signInWithPassword(app.server, `probe${i}-${run}@ratelimit.test`, "guess", address)).code).toBe("invalid");
    }
    const blocked = await signInWithPassword(app.server, email, password, address);
    expect(blocked.code).toBe("rate_limited");
    expect((await signInWithPassword(app.server, email, password, "10.3.0.1")).cookie).toBeDefined();
  });

  test("the address recovers when its failures leave the window", async () => {
    await age("address", address);
    expect((await signInWithPassword(app.server, email, password, address)).cookie).toBeDefined();
  });
});

// A lost database connection, made real: PostgreSQL itself ends the handler's session
// (pg_terminate_backend — what a restart or failover does to every session), or the handler's
// database does not accept connections at all. route() runs a read once more when the database
// answers again, refuses a write whose connection went mid-way (503, rolled back, nothing half
// saved), and runs again a write that never reached the database.
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import knexFactory, { type Knex } from "knex";
import { db } from "@/server/db/knex";
import { isConnectionError, isNotConnectedError } from "@/server/db/connection-error";
import { route } from "@/server/http/route";
import { closeTestDb, testDb } from "../support/db";

const table = `conn_loss_${process.pid}`;
let unreachable: Knex;

beforeAll(async () => {
  await testDb().schema.createTable(table, (t) => {
    t.increments("id");
    t.text("note");
  });
  // Port 1 on loopback refuses every connection at once, like a server that is restarting.
  unreachable = knexFactory({ client: "pg", connection: { connectionString: "postgres://nobody:x@127.0.0.1:1/none", connectionTimeoutMillis: 1000 }, pool: { min: 0, max: 1 }, acquireConnectionTimeout: 2000 });
});
afterAll(async () => {
  await testDb().schema.dropTableIfExists(table);
  await unreachable.destroy();
  await db().destroy();
  await closeTestDb();
});

/** Runs `work` on a pooled connection after PostgreSQL has ended that session. */
async function onKilledSession<T>(work: (trx: Knex.Transaction) => Promise<T>): Promise<T> {
  return db().transaction(async (trx) => {
    const { rows } = await trx.raw("SELECT pg_backend_pid() AS pid");
    await testDb().raw("SELECT pg_terminate_backend(?)", [rows[0].pid]);
    return work(trx);
  });
}

const call = (handler: (req: Request) => Promise<Response>, method: string, body?: unknown) =>
  handler(new Request("http://127.0.0.1/api/x", { method, headers: { "content-type": "application/json" }, ...(body ? { body: JSON.stringify(body) } : {}) }));

describe("connection errors are recognised", () => {
  test("a session ended by the server, and a refused connection", async () => {
    const killed = await onKilledSession((trx) => trx.raw("SELECT 1")).catch((e: unknown) => e);
    expect(isConnectionError(killed)).toBe(true);
    expect(isNotConnectedError(killed)).toBe(false);
    const refused = await unreachable.raw("SELECT 1").catch((e: unknown) => e);
    expect(isConnectionError(refused)).toBe(true);
    expect(isNotConnectedError(refused)).toBe(true);
    const wrong = await db().raw("SELECT * FROM no_such_table_here").catch((e: unknown) => e);
    expect(isConnectionError(wrong)).toBe(false);
  });
});

describe("route() on a lost connection", () => {
  test("a GET is run once more and answers 200", async () => {
    let calls = 0;
    const GET = route({ auth: "public" }, async () => {
      calls++;
      if (calls === 1) return onKilledSession((trx) => trx.raw("SELECT 1"));
      return { rows: (await db().raw("SELECT 2 AS n")).rows };
    });
    const res = await call(GET, "GET");
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ rows: [{ n: 2 }] });
    expect(calls).toBe(2);
  });

  test("a GET whose retry also fails answers 503, not 500", async () => {
    let calls = 0;
    const GET = route({ auth: "public" }, async () => {
      calls++;
      return onKilledSession((trx) => trx.raw("SELECT 1"));
    });
    const res = await call(GET, "GET");
    expect(res.status).toBe(503);
    expect((await res.json()).error.code).toBe("unavailable");
    expect(calls).toBe(2);
  });

  test("a write whose session is ended mid-transaction is refused once (503) and nothing of it is saved", async () => {
    let calls = 0;
    const POST = route({ auth: "public" }, async () => {
      calls++;
      return db().transaction(async (trx) => {
        await trx(table).insert({ note: "first half" });
        const { rows } = await trx.raw("SELECT pg_backend_pid() AS pid");
        await testDb().raw("SELECT pg_terminate_backend(?)", [rows[0].pid]);
        await trx(table).insert({ note: "second half" });
      });
    });
    const res = await call(POST, "POST", { any: 1 });
    expect(res.status).toBe(503);
    expect(calls).toBe(1);
    expect(await testDb()(table).count({ n: "*" })).toEqual([{ n: "0" }]);
  });

  test("a write that could not connect at all is run again, with its body, and saved once", async () => {
    let calls = 0;
    const POST = route({ auth: "public" }, async ({ req }) => {
      calls++;
      const { note } = (await req.json()) as { note: string };
      if (calls === 1) await unreachable.raw("SELECT 1");
      await db()(table).insert({ note });
      return { saved: note };
    });
    const res = await call(POST, "POST", { note: "after the outage" });
    expect(res.status).toBe(200);
    expect(calls).toBe(2);
    expect(await testDb()(table).pluck("note")).toEqual(["after the outage"]);
  });
});

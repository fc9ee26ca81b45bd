// A lost database connection, made real: PostgreSQL itself ends the handler's session
// (pg_terminate_backend — what a restart or failover does to every session), or the handler's
// database does not accept connections at all. route() runs a read once more when the database
// answers again, refuses a write whose connection went mid-way (503, rolled back, nothing half
// saved), and runs again a write that never reached the database.
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import knexFactory, { type Knex } from "knex";
import { createPool, db } from "@/server/db/knex";
import { isConnectionError, isNotConnectedError, transactionStatus } from "@/server/db/connection-error";
import { route } from "@/server/http/route";
import { action } from "@/server/http/action";
import { idempotent, noteTransactionId, outcomeOf, withWriteLedger, XACT_ID_COLUMN } from "@/server/db/write-ledger";
import { updateScheduleItem } from "@/server/services/update-schedule-item";
import { actorFor, makeMember } from "../support/checking";
import { makeProject } from "../support/schedule-fixtures";
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

/**
 * Runs `body` while a row with this note ends its own session inside COMMIT: a deferred constraint
 * trigger runs there, so the client has sent COMMIT and cannot know whether it took effect.
 */
async function whoseCommitDies(note: string, body: () => Promise<void>): Promise<void> {
  const fn = `${table}_die`;
  await testDb().raw(`CREATE FUNCTION ${fn}() RETURNS trigger LANGUAGE plpgsql AS $$ BEGIN IF NEW.note = '${note}' THEN PERFORM pg_terminate_backend(pg_backend_pid()); END IF; RETURN NEW; END $$`);
  await testDb().raw(`CREATE CONSTRAINT TRIGGER ${fn} AFTER INSERT ON ${table} DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION ${fn}()`);
  try {
    await body();
  } finally {
    await testDb().raw(`DROP TRIGGER ${fn} ON ${table}`);
    await testDb().raw(`DROP FUNCTION ${fn}()`);
    await testDb()(table).delete();
    // The pool may still hold the connection that died in its COMMIT: let it fail and go.
    for (let i = 0; i < 3; i++) await db().raw("SELECT 1").catch(() => undefined);
  }
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

  test("a write whose session is ended before its COMMIT is run again when the database answers, and saved once", async () => {
    let calls = 0;
    const POST = route({ auth: "public" }, async () => {
      calls++;
      return db().transaction(async (trx) => {
        await trx(table).insert({ note: `first half ${calls}` });
        if (calls === 1) {
          const { rows } = await trx.raw("SELECT pg_backend_pid() AS pid");
          await testDb().raw("SELECT pg_terminate_backend(?)", [rows[0].pid]);
        }
        await trx(table).insert({ note: `second half ${calls}` });
        return { calls };
      });
    });
    const res = await call(POST, "POST", { any: 1 });
    expect(res.status).toBe(200);
    expect(calls).toBe(2);
    // The first attempt's rows went with its connection; the second's are there, once.
    expect(await testDb()(table).orderBy("id").pluck("note")).toEqual(["first half 2", "second half 2"]);
    await testDb()(table).delete();
  });

  test("a write that loses its session before COMMIT on both attempts is refused (503) and nothing of it is saved", async () => {
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
    expect(calls).toBe(2);
    expect(await testDb()(table).count({ n: "*" })).toEqual([{ n: "0" }]);
  });

  test("a write whose connection goes while its COMMIT is in flight is refused once (503), never repeated", async () => {
    await whoseCommitDies("die at commit", async () => {
      let calls = 0;
      const POST = route({ auth: "public" }, async () => {
        calls++;
        await db().transaction((trx) => trx(table).insert({ note: "die at commit" }));
      });
      const res = await call(POST, "POST", { any: 1 });
      expect(res.status).toBe(503);
      expect(calls).toBe(1);
    });
  });

  test("a write that saved outside a transaction before its connection went is refused once (503), never repeated", async () => {
    let calls = 0;
    const POST = route({ auth: "public" }, async () => {
      calls++;
      await db()(table).insert({ note: "saved on its own" });
      await onKilledSession((trx) => trx.raw("SELECT 1"));
    });
    const res = await call(POST, "POST", { any: 1 });
    expect(res.status).toBe(503);
    expect(calls).toBe(1);
    expect(await testDb()(table).pluck("note")).toEqual(["saved on its own"]);
    await testDb()(table).delete();
  });

  test("a write that committed and then could not connect for a later statement is refused once (503), never repeated", async () => {
    // What a fast restart of PostgreSQL did under load: the row's transaction committed, the next
    // statement found "the database system is shutting down", and the write was run again (409).
    let calls = 0;
    const POST = route({ auth: "public" }, async () => {
      calls++;
      await db().transaction((trx) => trx(table).insert({ note: "committed first" }));
      await unreachable.raw("SELECT 1");
    });
    const res = await call(POST, "POST", { any: 1 });
    expect(res.status).toBe(503);
    expect(calls).toBe(1);
    expect(await testDb()(table).pluck("note")).toEqual(["committed first"]);
    await testDb()(table).delete();
  });

  test("a write whose COMMIT was cut off and that PostgreSQL says rolled back is run again, and saved once", async () => {
    // As above, the session ends inside its COMMIT; this time the transaction noted its id, so
    // the database is asked afterwards (pg_xact_status: "aborted") and the write is safe to repeat.
    await whoseCommitDies("cut off at commit", async () => {
      let calls = 0;
      const POST = route({ auth: "public" }, async () => {
        calls++;
        const note = calls === 1 ? "cut off at commit" : "saved on the second run";
        await db().transaction(async (trx) => noteTransactionId(await trx(table).insert({ note }).returning(trx.raw(XACT_ID_COLUMN))));
        return { calls };
      });
      const res = await call(POST, "POST", { any: 1 });
      expect(res.status).toBe(200);
      expect(await res.json()).toEqual({ calls: 2 });
      expect(await testDb()(table).pluck("note")).toEqual(["saved on the second run"]);
    });
  });

  test("a write that PostgreSQL says committed is answered by the route's ifCommitted (200), never repeated; without one it is refused (503)", async () => {
    let calls = 0;
    const work = async () => {
      calls++;
      await db().transaction(async (trx) => noteTransactionId(await trx(table).insert({ note: `committed ${calls}` }).returning(trx.raw(XACT_ID_COLUMN))));
      await unreachable.raw("SELECT 1");
    };
    const withAnswer = route({ auth: "public", ifCommitted: async () => ({ saved: await db()(table).orderBy("id").pluck("note") }) }, work);
    const res = await call(withAnswer, "POST", { any: 1 });
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ saved: ["committed 1"] });
    expect(calls).toBe(1);
    const without = await call(route({ auth: "public" }, work), "POST", { any: 1 });
    expect(without.status).toBe(503);
    expect(calls).toBe(2);
    expect(await testDb()(table).orderBy("id").pluck("note")).toEqual(["committed 1", "committed 2"]);
    await testDb()(table).delete();
  });

  test("the outcome is asked only of one noted transaction that holds the request's only COMMIT", async () => {
    const ask = async () => "committed";
    const noted = (n: number) => db().transaction(async (trx) => noteTransactionId(await trx(table).insert({ note: `t${n}` }).returning(trx.raw(XACT_ID_COLUMN))));
    const one = await withWriteLedger(() => noted(1));
    expect(one.ledger.xactId).toMatch(/^\d+$/);
    expect(await outcomeOf(one.ledger, ask)).toBe("committed");
    expect(await outcomeOf(one.ledger, transactionStatus)).toBe("committed");
    const two = await withWriteLedger(async () => {
      await noted(2);
      await db().transaction((trx) => trx(table).insert({ note: "t3" }));
    });
    expect(await outcomeOf(two.ledger, ask)).toBe("unknown");
    const outside = await withWriteLedger(async () => {
      await db()(table).insert({ note: "t4" });
      await noted(5);
    });
    expect(await outcomeOf(outside.ledger, ask)).toBe("unknown");
    const unnoted = await withWriteLedger(() => db().transaction((trx) => trx(table).insert({ note: "t6" })));
    expect(await outcomeOf(unnoted.ledger, ask)).toBe("unknown");
    await testDb()(table).delete();
  });

  test("a single-row edit of a schedule notes its transaction (with its audit row), so a cut-off COMMIT can be settled", async () => {
    const { email } = await makeMember("tarnbrook-sill", ["consultant"], "Ledger Consultant");
    const actor = await actorFor(email);
    // A fixture project of its own: the demo project's rows are the browser tests' (same database).
    const fx = await makeProject("tarnbrook-sill");
    const row = await testDb()("surfaces").where({ id: fx.surfaceIds[0] }).first("id", "project_id", "version", "label");
    const { ledger, outcome } = await withWriteLedger(() => updateScheduleItem(actor, row.project_id, "surfaces", row.id, row.version, { label: `${row.label} (edited)` }));
    expect(outcome.status).toBe("fulfilled");
    expect(ledger.commits).toHaveLength(1);
    expect(await outcomeOf(ledger, transactionStatus)).toBe("committed");
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

describe("the write ledger tells what a request may have changed", () => {
  const decisive = async (work: () => Promise<unknown>) => (await withWriteLedger(work)).ledger.decisive;

  test("reads, and transactions that never committed, are not decisive", async () => {
    await testDb()(table).delete();
    expect(await decisive(() => db().select(db().raw("1 AS n")))).toBe(false);
    expect(await decisive(() => db()(table).where({ note: "x" }))).toBe(false);
    const rolledBack = decisive(() =>
      db().transaction(async (trx) => {
        await trx(table).insert({ note: "not kept" });
        throw new Error("changed my mind");
      }),
    );
    expect(await rolledBack).toBe(false);
    expect(await testDb()(table).count({ n: "*" })).toEqual([{ n: "0" }]);
  });

  test("a COMMIT, a write outside a transaction and a SELECT that queues a job are decisive; an idempotent write is not", async () => {
    expect(await decisive(() => db().transaction((trx) => trx(table).insert({ note: "kept" })))).toBe(true);
    expect(await decisive(() => db()(table).where({ note: "kept" }).update({ note: "kept again" }))).toBe(true);
    expect(await decisive(() => db().raw("SELECT nextval(pg_get_serial_sequence(?, 'id'))", [table]))).toBe(true);
    expect(await decisive(() => idempotent(() => db()(table).where({ note: "kept again" }).update({ note: "kept" })))).toBe(false);
    await testDb()(table).delete();
  });
});

describe("action() on a lost connection", () => {
  test("a form whose transaction lost its session before COMMIT is saved by a second run", async () => {
    await testDb()(table).delete();
    let calls = 0;
    const save = action({ auth: "public" }, async () => {
      calls++;
      await db().transaction(async (trx) => {
        await trx(table).insert({ note: `form ${calls}` });
        if (calls === 1) {
          const { rows } = await trx.raw("SELECT pg_backend_pid() AS pid");
          await testDb().raw("SELECT pg_terminate_backend(?)", [rows[0].pid]);
          await trx.raw("SELECT 1");
        }
      });
    });
    expect(await save(null, new FormData())).toEqual({ ok: true });
    expect(calls).toBe(2);
    expect(await testDb()(table).pluck("note")).toEqual(["form 2"]);
    await testDb()(table).delete();
  });

  test("a form whose transaction PostgreSQL says committed before the connection went says it was saved, and is not run again", async () => {
    let calls = 0;
    const save = action({ auth: "public" }, async () => {
      calls++;
      await db().transaction(async (trx) => noteTransactionId(await trx(table).insert({ note: "form saved" }).returning(trx.raw(XACT_ID_COLUMN))));
      await unreachable.raw("SELECT 1");
    });
    const state = await save(null, new FormData());
    expect(state).toMatchObject({ ok: false, code: "unavailable", message: expect.stringMatching(/The change was saved/) });
    expect(calls).toBe(1);
    expect(await testDb()(table).pluck("note")).toEqual(["form saved"]);
    await testDb()(table).delete();
  });

  test("a form that saved outside a transaction and then lost its session says the save is uncertain, and is not run again", async () => {
    let calls = 0;
    const save = action({ auth: "public" }, async () => {
      calls++;
      await db()(table).insert({ note: "saved alone" });
      await onKilledSession((trx) => trx.raw("SELECT 1"));
    });
    const state = await save(null, new FormData());
    expect(state).toMatchObject({ ok: false, code: "unavailable", message: expect.stringMatching(/Reload the page to see whether the change was saved/) });
    expect(calls).toBe(1);
    expect(await testDb()(table).pluck("note")).toEqual(["saved alone"]);
    await testDb()(table).delete();
  });
});

describe("a read outside a transaction (pages, services) on a connection PostgreSQL ends", () => {
  let pool: Knex;
  beforeAll(() => {
    pool = createPool(process.env.TEST_DATABASE_URL!, 2);
  });
  afterAll(async () => {
    await pool.destroy();
  });

  /** Runs `sql` on `pool` and ends its session from outside while the statement sleeps. */
  async function endedMidway(sql: string, marker: string): Promise<{ result: unknown; ended: number[] }> {
    const running = pool.raw(sql).then((r: { rows: unknown }) => r.rows, (e: unknown) => e);
    const ended: number[] = [];
    for (let i = 0; i < 50 && ended.length === 0; i++) {
      await new Promise((r) => setTimeout(r, 50));
      const { rows } = await testDb().raw("SELECT pid FROM pg_stat_activity WHERE query LIKE ? AND pid <> pg_backend_pid()", [`%${marker}%`]);
      for (const { pid } of rows as { pid: number }[]) {
        await testDb().raw("SELECT pg_terminate_backend(?)", [pid]);
        ended.push(pid);
      }
    }
    return { result: await running, ended };
  }

  test("is run once more on a fresh connection and answers", async () => {
    const { result, ended } = await endedMidway("SELECT pg_backend_pid() AS pid, 'read-retry-a' AS marker FROM pg_sleep(0.6)", "read-retry-a");
    expect(ended).toHaveLength(1);
    expect(result).toEqual([{ pid: expect.any(Number), marker: "read-retry-a" }]);
    expect((result as { pid: number }[])[0]!.pid).not.toBe(ended[0]);
  });

  test("a write outside a transaction is not repeated: its error reaches the caller", async () => {
    const { result, ended } = await endedMidway(`WITH pause AS (SELECT pg_sleep(0.6)) INSERT INTO ${table} (note) SELECT 'read-retry-b' FROM pause RETURNING id`, "read-retry-b");
    expect(ended).toHaveLength(1);
    expect(isConnectionError(result)).toBe(true);
    expect(await testDb()(table).where({ note: "read-retry-b" }).count({ n: "*" })).toEqual([{ n: "0" }]);
  });

  test("a read inside a transaction is not repeated (the transaction is gone with its connection)", async () => {
    const outcome = await pool
      .transaction(async (trx) => {
        const { rows } = await trx.raw("SELECT pg_backend_pid() AS pid");
        await testDb().raw("SELECT pg_terminate_backend(?)", [rows[0].pid]);
        return trx.raw("SELECT 1");
      })
      .catch((e: unknown) => e);
    expect(isConnectionError(outcome)).toBe(true);
  });
});

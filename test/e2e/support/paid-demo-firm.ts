// The demo firm on the paid plan for the tests of one file or describe block, set straight in the
// database (as the billing tests' fixtures do) and put back as it was afterwards. The demo
// schedule is beyond the free plan's 40 rows, so adding rows needs it.
import { test } from "@playwright/test";
import knexFactory, { type Knex } from "knex";

/** Registers the beforeAll/afterAll pair; returns the database handle those tests may also use. */
export function usePaidDemoFirm(): () => Knex {
  let db: Knex;
  let before: Record<string, unknown> | undefined;
  const firmId = async () => (await db("firms").where({ slug: "tarnbrook-sill" }).first("id")).id as string;
  test.beforeAll(async () => {
    db = knexFactory({ client: "pg", connection: process.env.E2E_DATABASE_URL, pool: { min: 0, max: 1 } });
    const firm = await firmId();
    before = await db("firm_billing").where({ firm_id: firm }).first();
    await db("firm_billing").insert({ firm_id: firm, subscription_status: "active", subscription_seats: 50 }).onConflict("firm_id").merge({ subscription_status: "active", subscription_seats: 50 });
  });
  test.afterAll(async () => {
    const firm = await firmId();
    await db("firm_billing").where({ firm_id: firm }).delete();
    if (before) await db("firm_billing").insert(before);
    await db.destroy();
  });
  return () => db;
}

import knexFactory, { type Knex } from "knex";

let shared: Knex | undefined;

/** A Knex pool on the test database, for arranging and inspecting rows around HTTP calls. */
export function testDb(): Knex {
  shared ??= knexFactory({ client: "pg", connection: process.env.DATABASE_URL, pool: { min: 0, max: 3 } });
  return shared;
}

export async function closeTestDb(): Promise<void> {
  await shared?.destroy();
  shared = undefined;
}

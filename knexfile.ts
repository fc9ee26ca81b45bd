// Knex configuration for the CLI (`node --import tsx node_modules/knex/bin/cli.js …`), used by
// scripts/start.mjs, scripts/test.mjs and the migration tests. The app builds its own Knex
// instance in src/server/db/knex.ts from the validated environment.
import type { Knex } from "knex";
import { fileURLToPath } from "node:url";

const url = process.env.DATABASE_URL;
if (!url) {
  throw new Error("DATABASE_URL is not set. `npm start` and `npm test` set it for their own clusters.");
}

const here = (path: string) => fileURLToPath(new URL(path, import.meta.url));

const config: Knex.Config = {
  client: "pg",
  connection: url,
  pool: { min: 0, max: 4 },
  migrations: {
    directory: here("./db/migrations"),
    extension: "ts",
    loadExtensions: [".ts"],
    tableName: "knex_migrations",
  },
  seeds: {
    directory: here("./db/seeds"),
    extension: "ts",
    loadExtensions: [".ts"],
  },
};

export default config;

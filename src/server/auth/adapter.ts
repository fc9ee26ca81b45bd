import "server-only";
import PostgresAdapter from "@auth/pg-adapter";
import type { Adapter, AdapterUser } from "next-auth/adapters";
import pg from "pg";
import { queryDatabaseUrl } from "@/server/env";

const pools = ((globalThis as { __filmsheetAuthPools?: Map<string, pg.Pool> }).__filmsheetAuthPools ??= new Map());

// The adapter reads users with `select *`, which includes password_hash: strip every column
// Auth.js does not need before the row reaches callbacks, tokens or sessions.
function publicUser<T extends AdapterUser | null>(user: T): T {
  if (user === null) return user;
  const { id, name, email, emailVerified, image } = user;
  return { id: String(id), name, email, emailVerified, image } as T;
}

/** @auth/pg-adapter on its own small pool, with user rows cut down to their public columns. */
export function filmsheetAdapter(): Adapter {
  const url = queryDatabaseUrl();
  let pool = pools.get(url);
  if (!pool) {
    pool = new pg.Pool({ connectionString: url, max: 3, connectionTimeoutMillis: 5000 });
    pools.set(url, pool);
  }
  const base = PostgresAdapter(pool);
  return {
    ...base,
    createUser: async (user) => publicUser(await base.createUser!(user)),
    getUser: async (id) => publicUser(await base.getUser!(id)),
    getUserByEmail: async (email) => publicUser(await base.getUserByEmail!(email)),
    getUserByAccount: async (account) => publicUser(await base.getUserByAccount!(account)),
    updateUser: async (user) => publicUser(await base.updateUser!(user)),
  };
}

import "server-only";
import { db } from "@/server/db/knex";

/** Whether an account exists for this (lower-case) e-mail address. */
export async function userExists(email: string): Promise<boolean> {
  return (await db()("users").where({ email: email.toLowerCase() }).first("id")) !== undefined;
}

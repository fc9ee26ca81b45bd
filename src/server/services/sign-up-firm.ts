import "server-only";
import { randomBytes } from "node:crypto";
import type { TSignUp } from "@/schemas/auth";
import { hashPassword } from "@/server/auth/password";
import { db } from "@/server/db/knex";
import { isUniqueViolation } from "@/server/db/unique-violation";
import { AppError } from "@/server/http/app-error";
import { insertMemberships } from "@/server/repositories/memberships";
import { queueEmailConfirmation } from "./confirm-email";

function slugFor(name: string): string {
  const base = name.toLowerCase().normalize("NFKD").replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 40) || "firm";
  return `${base}-${randomBytes(3).toString("hex")}`;
}

/**
 * Creates a firm and its first member, who becomes its admin (and its consultant: a new firm is
 * usually one engineer who also does the work; the role can be taken away on the Members page).
 */
export async function signUpFirm(input: TSignUp): Promise<{ firm: { id: string; name: string }; user: { id: number; email: string } }> {
  const taken = () =>
    new AppError("conflict", "An account with this e-mail already exists: sign in, or reset its password", [{ field: "email", message: "Already has an account" }]);
  // The cheap refusal first: bcrypt (a quarter of a second of CPU) runs only for a sign-up that
  // can succeed, so repeating a taken address costs the server nothing.
  if (await db()("users").where({ email: input.email }).first("id")) throw taken();
  const passwordHash = await hashPassword(input.password);
  return db().transaction(async (trx) => {
    if (await trx("users").where({ email: input.email }).first("id")) throw taken();
    const [firm] = await trx("firms").insert({ name: input.firmName, slug: slugFor(input.firmName) }).returning(["id", "name"]);
    const [user] = await trx("users").insert({ name: input.name, email: input.email, password_hash: passwordHash }).returning(["id", "email"]);
    await insertMemberships(trx, firm.id, user.id, ["admin", "consultant"]);
    // The account works at once; its address counts as proven only once the link is followed.
    await queueEmailConfirmation(trx, user, firm.name);
    return { firm, user };
  }).catch((error: unknown) => {
    // Two sign-ups with one address at the same moment: the database's unique index decides.
    throw isUniqueViolation(error) ? taken() : error;
  });
}

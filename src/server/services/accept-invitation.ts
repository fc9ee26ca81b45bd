import "server-only";
import type { TInvitationAccept } from "@/schemas/auth";
import type { TRole } from "@/schemas/roles";
import { hashPassword } from "@/server/auth/password";
import { hashSecret } from "@/server/auth/secrets";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { lockFirmOrThrow, seatUsage, seatsFullError } from "@/server/repositories/firms";
import { insertMemberships } from "@/server/repositories/memberships";
import { authenticatePassword } from "./authenticate-password";
import { userExists } from "./user-exists";

const GONE: Record<string, string> = {
  accepted: "This invitation has already been accepted: sign in instead",
  revoked: "This invitation was withdrawn by the firm's admin: ask them for a new one",
  expired: "This invitation has expired: ask the firm's admin to resend it",
};

/**
 * Accepts an invitation: a new person chooses a name and password and gets an account; someone
 * who already has one proves it with their password (or by being signed in as that address).
 * The membership, the account and the closed invitation are saved together or not at all.
 */
export async function acceptInvitation(
  input: TInvitationAccept,
  who: { signedIn: { id: number; email: string } | null; address: string },
): Promise<{ firm: { id: string; name: string }; user: { id: number; email: string }; roles: TRole[]; accountCreated: boolean }> {
  // Hash a new account's password before the transaction: bcrypt is slow, locks should not wait.
  // Only an open invitation is worth bcrypt's time; a closed one is refused below without it.
  const invited = await db()("invitations")
    .where({ token_hash: hashSecret(input.token) })
    .whereNull("accepted_at")
    .whereNull("revoked_at")
    .andWhere("expires_at", ">", db().fn.now())
    .first("email");
  const newAccount = invited !== undefined && !(await userExists(invited.email));
  const passwordHash = newAccount && input.password !== undefined ? await hashPassword(input.password) : undefined;
  return db().transaction(async (trx) => {
    const inv = await trx("invitations").where({ token_hash: hashSecret(input.token) }).forUpdate().first();
    if (!inv) throw new AppError("not_found", "This invitation link is not valid: copy the whole link from the e-mail");
    const status = inv.accepted_at ? "accepted" : inv.revoked_at ? "revoked" : new Date(inv.expires_at) <= new Date() ? "expired" : "open";
    if (status !== "open") throw new AppError("gone", GONE[status]!);

    const firm = await lockFirmOrThrow(trx, inv.firm_id);
    // The open invitation already counts as used; more than bought means seats were reduced.
    const usage = await seatUsage(trx, firm.id);
    if (usage.used > usage.bought) throw seatsFullError(usage);

    let user = await trx("users").where({ email: inv.email }).first("id", "email");
    const accountCreated = user === undefined;
    if (user) {
      const { signedIn } = who;
      if (signedIn && signedIn.id !== user.id) throw new AppError("forbidden", `This invitation is for ${inv.email}; you are signed in as ${signedIn.email}`);
      if (!signedIn) {
        if (input.password === undefined) throw new AppError("invalid_input", "Enter the password of your Filmsheet account", [{ field: "password", message: "Enter your current password" }]);
        // Same limits as the sign-in form, so an invitation link is no way around them.
        const check = await authenticatePassword({ email: inv.email, password: input.password }, who.address);
        if (!check.ok && check.reason === "rate_limited") throw new AppError("too_many_requests", `Too many attempts: try again in ${Math.ceil(check.retryAfterSeconds / 60)} min`);
        if (!check.ok) throw new AppError("forbidden", "That is not the password of this account", [{ field: "password", message: "Wrong password" }]);
      }
    } else {
      const missing = [
        ...(input.name === undefined ? [{ field: "name", message: "Name is required" }] : []),
        ...(passwordHash === undefined ? [{ field: "password", message: "Choose a password of at least 10 characters" }] : []),
      ];
      if (missing.length) throw new AppError("invalid_input", "Choose your name and a password", missing);
      // Following the e-mailed link proves the address, so it counts as verified.
      [user] = await trx("users").insert({ email: inv.email, name: input.name, password_hash: passwordHash, emailVerified: trx.fn.now() }).returning(["id", "email"]);
    }
    await insertMemberships(trx, firm.id, user!.id, inv.roles);
    await trx("invitations").where({ id: inv.id }).update({ accepted_at: trx.fn.now(), updated_at: trx.fn.now(), version: trx.raw("version + 1") });
    return { firm: { id: firm.id, name: firm.name }, user: { id: user!.id, email: user!.email }, roles: inv.roles, accountCreated };
  });
}

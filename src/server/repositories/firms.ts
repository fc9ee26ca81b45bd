import "server-only";
import type { Knex } from "knex";
import { AppError } from "@/server/http/app-error";

export interface SeatUsage {
  bought: number;
  members: number;
  /** Open invitations that have not expired: each holds a seat until accepted or revoked. */
  pending: number;
  used: number;
}

/** Locks the firm's row for this transaction, so two invitations cannot both take the last seat. */
export async function lockFirmOrThrow(trx: Knex.Transaction, firmId: string): Promise<{ id: string; name: string; seats: number }> {
  const firm = await trx("firms").where({ id: firmId }).forUpdate().first("id", "name", "seats");
  if (!firm) throw new AppError("not_found", "Firm not found");
  return firm;
}

export async function seatUsage(q: Knex | Knex.Transaction, firmId: string): Promise<SeatUsage> {
  const { rows } = await q.raw<{ rows: { bought: number; members: string; pending: string }[] }>(
    `SELECT f.seats AS bought,
            (SELECT count(DISTINCT user_id) FROM memberships WHERE firm_id = f.id) AS members,
            (SELECT count(*) FROM invitations WHERE firm_id = f.id AND accepted_at IS NULL AND revoked_at IS NULL AND expires_at > now()) AS pending
       FROM firms f WHERE f.id = ?`,
    [firmId],
  );
  const row = rows[0];
  if (!row) throw new AppError("not_found", "Firm not found");
  const members = Number(row.members);
  const pending = Number(row.pending);
  return { bought: row.bought, members, pending, used: members + pending };
}

/** The clear refusal when every seat bought is taken. */
export function seatsFullError(usage: SeatUsage): AppError {
  const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? "" : "s"}`;
  return new AppError(
    "conflict",
    `All ${plural(usage.bought, "seat")} are in use (${plural(usage.members, "member")}, ${plural(usage.pending, "pending invitation")}). Buy more seats, or revoke a pending invitation or remove a member, before inviting someone else.`,
    [{ field: "email", message: "No free seat for another member" }],
  );
}

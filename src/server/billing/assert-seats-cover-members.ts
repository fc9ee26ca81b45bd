import "server-only";
import type { Knex } from "knex";
import { AppError } from "@/server/http/app-error";
import { seatUsage } from "@/server/repositories/firms";

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? "" : "s"}`;

/**
 * Refuses a seat count below the seats in use (members plus pending invitations): buying fewer
 * seats than people would leave someone without one. Members are never removed to make room.
 */
export async function assertSeatsCoverMembers(q: Knex | Knex.Transaction, firmId: string, seats: number): Promise<void> {
  const usage = await seatUsage(q, firmId);
  if (seats >= usage.used) return;
  const message = `${plural(seats, "seat")} would not cover the ${usage.used} in use (${plural(usage.members, "member")}, ${plural(usage.pending, "pending invitation")}). Choose at least ${usage.used}, or remove members or revoke invitations first.`;
  throw new AppError("conflict", message, [{ field: "seats", message: `At least ${usage.used} (seats in use)` }]);
}

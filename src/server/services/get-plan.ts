import "server-only";
import type { Knex } from "knex";
import { FREE_PLAN, isPaidStatus, type TPlan } from "@/schemas/billing";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";

/**
 * The firm's plan for pages and services: paid while its Stripe subscription is active or
 * trialing, free otherwise (never subscribed, payment failed, cancelled). Reads only our own
 * tables, which the Stripe webhooks keep current; it never calls Stripe.
 */
export async function getPlan(firmId: string, q: Knex | Knex.Transaction = db()): Promise<TPlan> {
  const row = await q("firms as f")
    .leftJoin("firm_billing as b", "b.firm_id", "f.id")
    .where("f.id", firmId)
    .first("f.seats", "b.subscription_status", "b.subscription_seats", "b.current_period_end", "b.cancel_at_period_end");
  if (!row) throw new AppError("not_found", "Firm not found");
  const paid = isPaidStatus(row.subscription_status);
  return {
    plan: paid ? "paid" : "free",
    status: row.subscription_status ?? null,
    seats: row.seats,
    subscribedSeats: row.subscription_seats ?? null,
    currentPeriodEnd: row.current_period_end ? new Date(row.current_period_end).toISOString() : null,
    cancelAtPeriodEnd: Boolean(row.cancel_at_period_end),
    limits: paid
      ? { projects: null, rowsPerProject: null, revisions: true, cleanReport: true }
      : { projects: FREE_PLAN.projects, rowsPerProject: FREE_PLAN.rowsPerProject, revisions: FREE_PLAN.revisions, cleanReport: FREE_PLAN.cleanReport },
  };
}

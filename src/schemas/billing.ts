import { z } from "zod";

/**
 * What a firm without a paid subscription gets. Paid firms have no limits. Shared by the server
 * check (assertPlanAllows) and the pages that explain the plans.
 */
export const FREE_PLAN = {
  projects: 1,
  rowsPerProject: 40,
  /** Design cases per project: each one multiplies the work of every result and report. */
  designCasesPerProject: 6,
  revisions: false,
  cleanReport: false,
  /** Seats a free firm may fill (members plus pending invitations). */
  seats: 5,
} as const;

/** Stripe subscription statuses that make a firm paid; anything else (past_due, canceled …) is free. */
export const PAID_STATUSES = ["active", "trialing"] as const;

export function isPaidStatus(status: string | null | undefined): boolean {
  return (PAID_STATUSES as readonly string[]).includes(status ?? "");
}

/** The largest seat count bought in one go; beyond it a firm talks to us. */
export const MAX_SEATS = 500;

export const ZSeats = z.object({
  seats: z.coerce
    .number({ error: "Seats must be a whole number" })
    .int("Seats must be a whole number")
    .min(1, "Buy at least 1 seat")
    .max(MAX_SEATS, `At most ${MAX_SEATS} seats can be bought here`),
});
export type TSeats = z.infer<typeof ZSeats>;

/** A firm's plan as pages and services read it. */
export interface TPlan {
  plan: "free" | "paid";
  /** Stripe's subscription status, or null when the firm never subscribed. */
  status: string | null;
  /** Seats the firm may fill now: the subscription's quantity when paid, else the free allowance. */
  seats: number;
  /** Seats on the subscription, even while it is lapsed (null without one). */
  subscribedSeats: number | null;
  currentPeriodEnd: string | null;
  cancelAtPeriodEnd: boolean;
  limits: { projects: number | null; rowsPerProject: number | null; revisions: boolean; cleanReport: boolean };
}

export type TPlanNeed = "projects" | "rows" | "revisions" | "cleanReport";

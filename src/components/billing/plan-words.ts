import { FREE_PLAN, type TPlan } from "@/schemas/billing";

/** What each Stripe subscription status means to a firm, in Filmsheet's words. */
export const STATUS_WORDS: Record<string, string> = {
  active: "Paid",
  trialing: "Paid (trial)",
  past_due: "Payment overdue",
  unpaid: "Unpaid",
  canceled: "Cancelled",
  incomplete: "Awaiting first payment",
  incomplete_expired: "Checkout not completed",
  paused: "Paused",
};

export function planLabel(plan: TPlan): string {
  if (plan.plan === "paid") return "Paid plan";
  return plan.status === null ? "Free plan" : "Free limits";
}

/** The two plans side by side, as lines a page can list. */
export const PLAN_LINES: { what: string; free: string; paid: string }[] = [
  { what: "Projects", free: `${FREE_PLAN.projects}`, paid: "Unlimited" },
  { what: "Rows per project", free: `Up to ${FREE_PLAN.rowsPerProject}`, paid: "Unlimited" },
  { what: "Design cases per project", free: `Up to ${FREE_PLAN.designCasesPerProject}`, paid: "Unlimited" },
  { what: "Calculation report", free: "Marked “not for issue”", paid: "Clean, for issue" },
  { what: "Revisions", free: "—", paid: "Issue frozen revisions A, B, C …" },
  { what: "Seats", free: `${FREE_PLAN.seats}`, paid: "As many as you buy" },
];

export function money(minor: number, currency: string): string {
  return new Intl.NumberFormat("en-GB", { style: "currency", currency: currency.toUpperCase() }).format(minor / 100);
}

export const day = (iso: string) => new Date(iso).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

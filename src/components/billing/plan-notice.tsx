import { Link } from "@/components/shell/link";
import { FREE_PLAN, type TPlan } from "@/schemas/billing";
import { STATUS_WORDS } from "./plan-words";

/**
 * The banner a free (or lapsed) firm sees above its work: what the free plan holds, how much of
 * it is used, and the way to upgrade (a link for admins, a word to ask one for everyone else).
 */
export function PlanNotice({ plan, projects, isAdmin }: { plan: TPlan; projects: number; isAdmin: boolean }) {
  if (plan.plan === "paid") return null;
  const lapsed = plan.status !== null;
  return (
    <aside aria-label="Plan" className="flex flex-wrap items-center justify-between gap-3 rounded-panel border border-caution/40 bg-caution/10 px-5 py-3">
      <div className="grid gap-0.5">
        <p className="text-small font-semibold">
          {lapsed ? `Subscription ${STATUS_WORDS[plan.status!]?.toLowerCase() ?? plan.status}: your firm is held to the free limits` : "Your firm is on the free plan"}
        </p>
        <p className="text-small text-muted">
          {projects <= FREE_PLAN.projects ? `${projects} of ${FREE_PLAN.projects} project used` : `${projects} projects kept, but no new ones (the free plan holds ${FREE_PLAN.projects})`} · up to{" "}
          {FREE_PLAN.rowsPerProject} rows per project · reports marked “not for issue” · no revisions.
          {lapsed ? " Nothing has been deleted." : ""}
        </p>
      </div>
      {isAdmin ? (
        <Link href="/firm/billing" className="rounded-chip bg-accent px-3 py-2 text-small font-semibold text-accent-ink hover:opacity-90">
          {lapsed ? "Restore the paid plan" : "Upgrade"}
        </Link>
      ) : (
        <p className="text-small text-muted">Ask a firm admin to upgrade under Firm › Billing.</p>
      )}
    </aside>
  );
}

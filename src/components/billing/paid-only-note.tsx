import { Link } from "@/components/shell/link";

/**
 * Where a free (or lapsed) firm meets something only the paid plan does: what it is, what the
 * free plan keeps, and the way to upgrade (firm admins) or whom to ask (everyone else).
 */
export function PaidOnlyNote({ what, isAdmin }: { what: string; isAdmin: boolean }) {
  return (
    <div role="note" aria-label="Paid plan" className="flex flex-wrap items-center justify-between gap-3 rounded-chip border border-caution/40 bg-caution/10 px-3 py-2 text-small">
      <p>
        {what} needs the paid plan. On the free plan the schedule stays a draft and its reports are marked “not for issue”; nothing is lost by upgrading later.
      </p>
      {isAdmin ? (
        <Link href="/firm/billing" className="rounded-chip bg-accent px-3 py-1.5 font-semibold text-accent-ink hover:opacity-90">
          Upgrade
        </Link>
      ) : (
        <span className="text-muted">Ask a firm admin to upgrade under Firm › Billing.</span>
      )}
    </div>
  );
}

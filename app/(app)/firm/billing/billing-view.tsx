import { PLAN_LINES, STATUS_WORDS, day, money, planLabel } from "@/components/billing/plan-words";
import { PageHeader, Panel } from "@/components/panel";
import type { BillingOverview } from "@/server/billing/get-billing-overview";
import { FREE_PLAN } from "@/schemas/billing";
import { AdminOnly } from "../admin-only";
import { FirmNav } from "../firm-nav";
import { SeatMeter } from "../seat-meter";
import { InvoiceTable } from "./invoice-table";
import { PortalButton } from "./portal-button";
import { SeatsForm } from "./seats-form";

function Notice({ tone, children }: { tone: "ok" | "caution"; children: React.ReactNode }) {
  const tones = { ok: "border-ok/40 bg-ok/10", caution: "border-caution/40 bg-caution/10" };
  return (
    <p role="status" className={`rounded-panel border px-5 py-3 text-small ${tones[tone]}`}>
      {children}
    </p>
  );
}

export function BillingView({ overview, checkout }: { overview: BillingOverview | null; checkout: "done" | "cancelled" | null }) {
  return (
    <div className="grid gap-6">
      <PageHeader title="Billing" lead="The firm's plan, seats and invoices. Payments are taken by Stripe; Filmsheet never sees card details." />
      <FirmNav current="/firm/billing" isAdmin={overview !== null} />
      {overview === null ? <AdminOnly /> : <Billing overview={overview} checkout={checkout} />}
    </div>
  );
}

function Billing({ overview, checkout }: { overview: BillingOverview; checkout: "done" | "cancelled" | null }) {
  const { plan, seats, price, nextInvoice } = overview;
  const paid = plan.plan === "paid";
  const overdue = plan.status === "past_due" || plan.status === "unpaid";
  const subscribed = plan.status !== null && plan.status !== "canceled" && plan.status !== "incomplete_expired";
  const priceLabel = price ? `${money(price.unitAmount, price.currency)} per seat per ${price.interval}` : null;
  return (
    <>
      {checkout === "done" ? (
        <Notice tone={paid ? "ok" : "caution"}>
          {paid ? `Payment received: the firm is on the paid plan with ${plan.seats} seats.` : "Payment received; the plan changes as soon as Stripe confirms it. Reload in a moment."}
        </Notice>
      ) : null}
      {checkout === "cancelled" ? <Notice tone="caution">Checkout cancelled: nothing was charged and the plan is unchanged.</Notice> : null}
      {overview.stripeProblem ? <Notice tone="caution">{overview.stripeProblem}</Notice> : null}

      <div className="grid gap-6 lg:grid-cols-2">
        <Panel title="Plan" lead={paid ? "Everything Filmsheet does, for every seat." : "What the firm has now, and what a paid plan adds."} actions={plan.status !== null ? <PortalButton /> : undefined}>
          <div className="grid gap-4">
            <p className="flex flex-wrap items-baseline gap-3">
              <strong className={`text-title ${paid ? "text-ok" : "text-ink"}`}>{planLabel(plan)}</strong>
              {plan.status && !paid ? <span className={`text-small ${overdue ? "text-danger" : "text-muted"}`}>Subscription: {STATUS_WORDS[plan.status] ?? plan.status}</span> : null}
              {paid && plan.currentPeriodEnd && !plan.cancelAtPeriodEnd ? <span className="text-small text-muted">{plan.subscribedSeats} seats · renews {day(plan.currentPeriodEnd)}</span> : null}
            </p>
            {overdue ? (
              <p className="text-small text-danger">The last payment failed, so the firm is held to the free limits. Nothing has been deleted: pay the overdue invoice under “Manage payment” to lift them.</p>
            ) : null}
            {plan.status === "canceled" ? <p className="text-small text-muted">The subscription has ended. Every project and row is kept; buy seats again to lift the free limits.</p> : null}
            {plan.cancelAtPeriodEnd && plan.currentPeriodEnd ? <p className="text-small text-caution">Ends on {day(plan.currentPeriodEnd)}; it will not renew.</p> : null}
            <table className="w-full text-left text-small">
              <thead className="text-micro uppercase text-muted">
                <tr>
                  <th className="py-1.5 pr-3 font-medium"></th>
                  <th className={`py-1.5 pr-3 font-medium ${paid ? "" : "text-ink"}`}>Free</th>
                  <th className={`py-1.5 font-medium ${paid ? "text-ink" : ""}`}>Paid</th>
                </tr>
              </thead>
              <tbody>
                {PLAN_LINES.map((l) => (
                  <tr key={l.what} className="border-t border-line">
                    <th scope="row" className="py-1.5 pr-3 font-medium">{l.what}</th>
                    <td className={`py-1.5 pr-3 ${paid ? "text-muted" : ""}`}>{l.free}</td>
                    <td className={`py-1.5 ${paid ? "" : "text-muted"}`}>{l.paid}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </Panel>

        <Panel title="Seats" lead={paid ? "Seats bought on the subscription, and who fills them." : "Every member and every pending invitation takes a seat."}>
          <div className="grid gap-5">
            <SeatMeter seats={seats} />
            {subscribed && !paid ? (
              <p className="text-small text-muted">Seats can be changed again once the subscription is paid up (“Manage payment”).</p>
            ) : (
              <SeatsForm mode={subscribed ? "change" : "buy"} suggested={subscribed ? plan.seats : Math.max(seats.used, FREE_PLAN.seats, 1)} minimum={seats.used} priceLabel={priceLabel} />
            )}
          </div>
        </Panel>
      </div>

      <Panel title="Next invoice" lead={nextInvoice ? "Charged to the card on file." : undefined}>
        {nextInvoice ? (
          <dl className="grid grid-cols-[auto_1fr] gap-x-6 gap-y-1 text-small">
            <dt className="text-muted">Amount</dt>
            <dd className="tabular font-semibold">{money(nextInvoice.amountDue, nextInvoice.currency)}</dd>
            <dt className="text-muted">Date</dt>
            <dd>{day(nextInvoice.date)}</dd>
            {nextInvoice.description ? (
              <>
                <dt className="text-muted">For</dt>
                <dd>{nextInvoice.description}</dd>
              </>
            ) : null}
          </dl>
        ) : (
          <p className="text-small text-muted">{paid ? "No further invoice: the subscription does not renew." : "Nothing is due: the firm has no subscription that bills."}</p>
        )}
      </Panel>

      <Panel title="Invoices" lead="Every invoice Stripe has issued to the firm, newest first.">
        <InvoiceTable invoices={overview.invoices} />
      </Panel>
    </>
  );
}

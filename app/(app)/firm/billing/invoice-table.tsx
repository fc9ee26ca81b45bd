import { day, money } from "@/components/billing/plan-words";
import type { BillingOverview } from "@/server/billing/get-billing-overview";

const TONE: Record<string, string> = { paid: "text-ok", open: "text-danger", void: "text-muted", uncollectible: "text-danger", draft: "text-muted" };

/** The firm's invoices: number, date, amount and whether it was paid. */
export function InvoiceTable({ invoices }: { invoices: BillingOverview["invoices"] }) {
  if (invoices.length === 0) return <p className="text-small text-muted">No invoices yet.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-small">
        <thead className="text-micro uppercase text-muted">
          <tr>
            {["Number", "Date", "Amount", "Status", ""].map((h) => (
              <th key={h} className="py-2 pr-4 font-medium">{h}</th>
            ))}
          </tr>
        </thead>
        <tbody>
          {invoices.map((i) => (
            <tr key={i.id} className="border-t border-line">
              <td className="py-2 pr-4 font-mono">{i.number ?? i.id}</td>
              <td className="py-2 pr-4">{day(i.date)}</td>
              <td className="tabular py-2 pr-4">{money(i.total, i.currency)}</td>
              <td className={`py-2 pr-4 font-medium ${TONE[i.status ?? ""] ?? ""}`}>{i.status === "open" ? "unpaid" : (i.status ?? "—")}</td>
              <td className="flex gap-3 py-2">
                {i.pdf ? (
                  <a className="text-accent hover:underline" href={i.pdf} aria-label={`PDF of invoice ${i.number ?? i.id}`}>
                    PDF
                  </a>
                ) : null}
                {i.url ? <a className="text-accent hover:underline" href={i.url}>View</a> : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

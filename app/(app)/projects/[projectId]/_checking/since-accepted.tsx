import { when } from "@/components/checking/when";
import type { RowWorking } from "@/server/services/get-row-working";

/**
 * At the top of a row sent back to unchecked: who accepted it and when, and what it is computed
 * from that changed since (before → after), so the checker reads the change, not the whole row.
 */
export function SinceAccepted({ since }: { since: NonNullable<RowWorking["since_accepted"]> }) {
  const by = `${since.accepted_by_name ?? "a checker no longer in the firm"}, ${when(since.accepted_at)}${since.in_bulk ? ", in bulk from the check list" : ""}`;
  return (
    <section aria-label="Changed since accepted" className="rounded-panel border border-caution/60 bg-surface px-5 py-4 shadow-panel">
      <h2 className="text-lead font-semibold">Changed since it was accepted</h2>
      <p className="text-small text-muted">
        Accepted by {by}
        {since.row_version === null ? "" : ` (version ${since.row_version})`}.{" "}
        {since.changes.length === 0 ? "Nothing it is computed from differs now: its results are as accepted." : "Since then:"}
      </p>
      {since.changes.length > 0 ? (
        <div className="mt-3 grid gap-3">
          {since.changes.map((c) => (
            <div key={`${c.heading}`}>
              <h3 className="text-small font-semibold">
                {c.heading}
                {c.note ? <span className="font-normal text-muted"> — {c.note}</span> : null}
              </h3>
              {c.fields.length > 0 ? (
                <table className="mt-1 w-full table-fixed text-small">
                  <colgroup>
                    <col className="w-[34%]" />
                    <col className="w-[30%]" />
                    <col className="w-[6%]" />
                    <col />
                  </colgroup>
                  <thead className="sr-only">
                    <tr>
                      <th>Input</th>
                      <th>When accepted</th>
                      <th />
                      <th>Now</th>
                    </tr>
                  </thead>
                  <tbody>
                    {c.fields.map((f) => (
                      <tr key={f.label} className="border-b border-line/60 align-top">
                        <td className="py-1 pr-3 text-muted">{f.label}</td>
                        <td className="py-1 pr-2 text-right tabular-nums line-through decoration-muted/60">{f.before}</td>
                        <td className="py-1 text-center text-muted" aria-hidden>
                          →
                        </td>
                        <td className="py-1 pl-2 font-medium tabular-nums">{f.after}</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              ) : null}
            </div>
          ))}
        </div>
      ) : null}
    </section>
  );
}

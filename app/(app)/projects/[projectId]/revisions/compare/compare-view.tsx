import { Link } from "@/components/shell/link";
import { SHEET_LABELS } from "@/checking/check-machine";
import type { FieldChange, RevisionComparison } from "@/checking/compare-revisions";
import { revisionPath, revisionsPath } from "@/checking/paths";
import { EngineeringCaution } from "@/components/engineering-caution";
import { SectionHeader } from "@/components/checking/section-header";
import { Panel } from "@/components/panel";
import type { TProject } from "@/schemas/project";

const w = (v: number | null | undefined) => (v === null || v === undefined ? "—" : Math.round(v).toLocaleString("en-GB"));
const signed = (v: number) => `${v > 0 ? "+" : v < 0 ? "−" : "±"}${Math.abs(Math.round(v)).toLocaleString("en-GB")}`;
const val = (v: unknown) => (v === null || v === undefined ? "blank" : typeof v === "object" ? JSON.stringify(v) : String(v));
const changes = (fields: FieldChange[]) => fields.map((f) => `${f.field} ${val(f.before)} → ${val(f.after)}`).join("; ");

const SETTING_NOUNS = { design_cases: "Design case", zones: "Zone", buildups: "Build-up" } as const;

/** What changed between two issued revisions. */
export function CompareView({ project, comparison, problem }: { project: TProject; comparison?: RevisionComparison & { from: string; to: string }; problem?: string }) {
  const c = comparison;
  return (
    <div className="grid gap-6">
      <p className="text-small text-muted">
        <Link href={revisionsPath(project.id)} className="hover:underline">
          Revisions
        </Link>{" "}
        / compare
      </p>
      <SectionHeader
        title={c ? `Revision ${c.from} → revision ${c.to}` : "Compare revisions"}
        lead={c ? <>What changed in {project.reference} from <Link className="text-accent" href={revisionPath(project.id, c.from)}>revision {c.from}</Link> to <Link className="text-accent" href={revisionPath(project.id, c.to)}>revision {c.to}</Link>.</> : problem}
      />
      {c ? (
        <>
          <Panel title="Rows" lead={`${c.rows.added.length} added · ${c.rows.removed.length} removed · ${c.rows.changed.length} changed`}>
            <div className="grid gap-4 text-small">
              <section aria-label="Rows added">
                <h3 className="font-semibold">Added</h3>
                {c.rows.added.length === 0 ? <p className="text-muted">None</p> : <ul>{c.rows.added.map((r) => <li key={r.id}>+ {SHEET_LABELS[r.sheet]} {r.label}</li>)}</ul>}
              </section>
              <section aria-label="Rows removed">
                <h3 className="font-semibold">Removed</h3>
                {c.rows.removed.length === 0 ? <p className="text-muted">None</p> : <ul>{c.rows.removed.map((r) => <li key={r.id}>− {SHEET_LABELS[r.sheet]} {r.label}</li>)}</ul>}
              </section>
              <section aria-label="Rows changed">
                <h3 className="font-semibold">Changed</h3>
                {c.rows.changed.length === 0 ? (
                  <p className="text-muted">None</p>
                ) : (
                  <ul className="grid gap-2">
                    {c.rows.changed.map((r) => (
                      <li key={r.id}>
                        <p>
                          {SHEET_LABELS[r.sheet]} {r.label}: <span className="font-mono text-micro">{r.fields.length > 0 ? changes(r.fields) : "inputs unchanged; results moved with what it depends on"}</span>
                        </p>
                        <ul className="text-micro text-muted">
                          {r.flows.map((f) => (
                            <li key={f.design_case_id}>
                              {f.design_case}: Q {w(f.before_W)} W → {w(f.after_W)} W
                            </li>
                          ))}
                        </ul>
                      </li>
                    ))}
                  </ul>
                )}
              </section>
            </div>
          </Panel>
          {c.settings.length > 0 ? (
            <Panel title="Design cases, zones and build-ups">
              <ul className="grid gap-1 text-small">
                {c.settings.map((s) => (
                  <li key={`${s.entity}:${s.id}`}>
                    {SETTING_NOUNS[s.entity]} {s.name}: {s.change}
                    {s.fields.length > 0 ? <span className="font-mono text-micro"> — {changes(s.fields)}</span> : null}
                  </li>
                ))}
              </ul>
            </Panel>
          ) : null}
          <Panel title="Zone totals" lead="Heat loss and heat gain of every zone in every design case, before and after">
            <div className="overflow-x-auto">
              <table className="w-full text-small">
                <thead className="text-left text-micro uppercase tracking-[0.08em] text-muted">
                  <tr>
                    <th className="py-2 pr-3">Design case</th>
                    <th className="py-2 pr-3">Zone</th>
                    <th className="py-2 pr-3 text-right">Loss {c.from} (W)</th>
                    <th className="py-2 pr-3 text-right">Loss {c.to} (W)</th>
                    <th className="py-2 pr-3 text-right">Change</th>
                    <th className="py-2 pr-3 text-right">Gain {c.from} (W)</th>
                    <th className="py-2 pr-3 text-right">Gain {c.to} (W)</th>
                    <th className="py-2 text-right">Change</th>
                  </tr>
                </thead>
                <tbody>
                  {c.zones.map((z) => (
                    <tr key={`${z.design_case_id}:${z.zone_id}`} className="border-t border-line/60">
                      <td className="py-1.5 pr-3">{z.design_case}</td>
                      <td className="py-1.5 pr-3">{z.zone}</td>
                      <td className="py-1.5 pr-3 text-right tabular-nums">{w(z.before?.loss_W)}</td>
                      <td className="py-1.5 pr-3 text-right tabular-nums">{w(z.after?.loss_W)}</td>
                      <td className="py-1.5 pr-3 text-right font-semibold tabular-nums">{signed(z.loss_delta_W)}</td>
                      <td className="py-1.5 pr-3 text-right tabular-nums">{w(z.before?.gain_W)}</td>
                      <td className="py-1.5 pr-3 text-right tabular-nums">{w(z.after?.gain_W)}</td>
                      <td className="py-1.5 text-right font-semibold tabular-nums">{signed(z.gain_delta_W)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          </Panel>
        </>
      ) : null}
      <EngineeringCaution />
    </div>
  );
}

import { Link } from "@/components/shell/link";
import { exclusionsSentence, type RowResult } from "@/calc/index";
import type { TCheckSheet } from "@/checking/check-machine";
import { revisionPath, revisionsPath } from "@/checking/paths";
import { when } from "@/components/checking/when";
import { EngineeringCaution } from "@/components/engineering-caution";
import { Panel } from "@/components/panel";
import { RevisionReportLink } from "@/components/reports/report-build";
import type { TReportBuild } from "@/schemas/reports";
import type { TRevision } from "@/server/services/get-revision";
import { DUCT_COLS, RevisionRows, SURFACE_COLS, num, type FrozenRow } from "./revision-rows";
import { formatCount } from "@/units/format";

function frozenResult(r: RowResult | undefined): Pick<FrozenRow, "result" | "checks"> {
  return { result: r?.result, checks: r ? { spread: r.spread, inside: r.inside } : undefined };
}

/** An issued revision as it was frozen: zone totals and every row's results for one design case. */
export function RevisionView({ revision, caseId, reportBuild }: { revision: TRevision; caseId?: string; reportBuild: TReportBuild | null }) {
  const s = revision.snapshot;
  const pid = s.project.id;
  const dc = s.design_cases.find((d) => d.id === caseId) ?? s.design_cases[0];
  const results = s.results.find((r) => r.design_case_id === dc?.id);
  const zoneName = new Map(s.zones.map((z) => [z.id, z.name]));
  const stateOf = new Map(s.checks.map((c) => [`${c.sheet} ${c.row_id}`, c.state]));
  const comments = new Map<string, number>();
  for (const c of s.comments) comments.set(`${c.sheet} ${c.row_id}`, (comments.get(`${c.sheet} ${c.row_id}`) ?? 0) + 1);
  const frozen = (sheet: TCheckSheet, rows: { id: string; label: string; zone_id: string }[]): FrozenRow[] =>
    rows.map((row) => ({
      id: row.id,
      label: row.label,
      zone: zoneName.get(row.zone_id) ?? "",
      ...frozenResult(results?.[sheet].find((r) => r.row_id === row.id)),
      state: stateOf.get(`${sheet} ${row.id}`) ?? "unchecked",
      comments: comments.get(`${sheet} ${row.id}`) ?? 0,
    }));
  const checkers = [...new Set(s.checks.map((c) => c.checked_by_name).filter(Boolean))].join(", ");
  return (
    <div className="grid gap-6">
      <header className="grid gap-2">
        <p className="text-small text-muted">
          <Link href={revisionsPath(pid)} className="hover:underline">
            Revisions
          </Link>{" "}
          / {s.project.reference}
        </p>
        <div className="flex flex-wrap items-end justify-between gap-3">
          <h2 className="text-title font-semibold">Revision {revision.letter}</h2>
          <RevisionReportLink projectId={pid} letter={revision.letter} initial={reportBuild} />
        </div>
        <p className="text-small text-muted">
          {s.project.name} · issued by {revision.issued_by_name}, {when(revision.issued_at)} · {revision.rows} rows, all accepted{checkers ? ` (checked by ${checkers})` : ""}
        </p>
        {revision.note ? <p className="max-w-prose">“{revision.note}”</p> : null}
        <p className="max-w-prose rounded-chip border border-line bg-sunken px-3 py-2 text-small" role="note">
          This revision is frozen: it never changes, and the database refuses any attempt to change it. Later edits go into the next draft.
        </p>
        <nav aria-label="Design case" className="flex flex-wrap gap-1">
          {s.design_cases.map((d) => (
            <Link key={d.id} href={`${revisionPath(pid, revision.letter)}?case=${d.id}`} aria-current={d.id === dc?.id ? "page" : undefined} className="rounded-chip border border-line px-2 py-1 text-small hover:bg-sunken aria-[current=page]:border-accent aria-[current=page]:bg-accent-soft">
              {d.name}
            </Link>
          ))}
        </nav>
      </header>

      <Panel title="Zone totals" lead={dc ? `${dc.name}: ${dc.T_outdoor_C} °C outside, wind ${dc.V_met_m_s} m/s at the mast` : "No design case"}>
        <table className="w-full text-small">
          <thead className="text-left text-micro tracking-[0.02em] text-muted">
            <tr>
              <th className="py-2 pr-3">Zone</th>
              <th className="py-2 pr-3 text-right">Heat loss (W)</th>
              <th className="py-2 pr-3 text-right">of which distribution (W)</th>
              <th className="py-2 pr-3 text-right">(W/m²)</th>
              <th className="py-2 pr-3 text-right">Heat gain (W)</th>
              <th className="py-2 pr-3 text-right">of which distribution (W)</th>
              <th className="py-2 text-right">(W/m²)</th>
            </tr>
          </thead>
          <tbody>
            {(results?.zones ?? []).map((z) => (
              <tr key={z.zone_id} className="border-t border-line/60">
                <td className="py-1.5 pr-3">{z.name}</td>
                <td className="py-1.5 pr-3 text-right tabular-nums text-frost">{num(z.loss_W, 0)}</td>
                <td className="py-1.5 pr-3 text-right tabular-nums text-muted">{num(z.ducts_loss_W, 0)}</td>
                <td className="py-1.5 pr-3 text-right tabular-nums">{num(z.loss_W_m2)}</td>
                <td className="py-1.5 pr-3 text-right tabular-nums text-heat">{num(z.gain_W, 0)}</td>
                <td className="py-1.5 pr-3 text-right tabular-nums text-muted">{num(z.ducts_gain_W, 0)}</td>
                <td className="py-1.5 text-right tabular-nums">{num(z.gain_W_m2)}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <p className="mt-2 text-micro text-muted">Distribution: duct runs crossing unconditioned or outdoor space. {exclusionsSentence()}</p>
      </Panel>

      <Panel title="Surfaces" lead={`${formatCount(s.surfaces.length)} rows`}>
        <RevisionRows sheet="surfaces" rows={frozen("surfaces", s.surfaces)} cols={SURFACE_COLS} />
      </Panel>
      <Panel title="Duct runs" lead={`${formatCount(s.duct_runs.length)} rows`}>
        <RevisionRows sheet="duct_runs" rows={frozen("duct_runs", s.duct_runs)} cols={DUCT_COLS} />
      </Panel>
      <EngineeringCaution />
    </div>
  );
}

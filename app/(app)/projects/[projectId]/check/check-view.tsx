import Link from "next/link";
import { CHECK_STATES, SHEET_LABELS, STATE_LABELS, type TCheckSheet, type TCheckState } from "@/checking/check-machine";
import { historyPath, revisionsPath, rowPath } from "@/checking/paths";
import { StateBadge } from "@/components/checking/state-badge";
import { SectionHeader } from "@/components/checking/section-header";
import { Panel } from "@/components/panel";
import type { CheckBoard } from "@/server/services/get-check-board";
import { PaidOnlyNote } from "@/components/billing/paid-only-note";
import { AcceptListedForm, IssueRevisionForm, RequestCheckForm } from "../_checking/check-forms";
import { MuteForm } from "../_checking/mute-form";

type Filter = { state?: TCheckState; sheet?: TCheckSheet };

function filterHref(projectId: string, f: Filter): string {
  const q = new URLSearchParams(Object.entries(f).filter(([, v]) => v !== undefined) as [string, string][]).toString();
  return `/projects/${projectId}/check${q ? `?${q}` : ""}`;
}

function FilterLink({ projectId, filter, to, children }: { projectId: string; filter: Filter; to: Filter; children: React.ReactNode }) {
  const current = filter.state === to.state && filter.sheet === to.sheet;
  return (
    <Link href={filterHref(projectId, to)} aria-current={current ? "page" : undefined} className="rounded-chip border border-line px-2 py-1 text-small hover:bg-sunken aria-[current=page]:border-accent aria-[current=page]:bg-accent-soft">
      {children}
    </Link>
  );
}

/** The check view: counts, filters, every row with its state, and the moves open to this person. */
export function CheckView({ board, filter, muted, canCheck, canRequest, userId, freePlan }: { board: CheckBoard; filter: Filter; muted: boolean; canCheck: boolean; canRequest: boolean; userId: number | null; freePlan: { isAdmin: boolean } | null }) {
  const { project, counts, rows } = board;
  const pid = project.id;
  const accepted = counts.rows === 0 ? 0 : Math.round((100 * counts.accepted) / counts.rows);
  const ready = counts.rows > 0 && counts.accepted === counts.rows;
  // Rows listed that this checker may accept in one go: not accepted, and not last edited by them.
  const acceptable = rows.filter((r) => r.state !== "accepted" && r.last_edited_by !== userId);
  return (
    <div className="grid gap-6">
      <SectionHeader title="Check" lead={<>Read each row&apos;s working, then accept it or query it. When every row is accepted, a checker issues revision {board.next_revision}.</>}>
        <div className="flex flex-wrap gap-2 text-small">
          {board.next_unchecked ? (
            <Link href={rowPath(pid, board.next_unchecked.sheet, board.next_unchecked.id)} className="rounded-chip bg-accent px-3 py-2 font-semibold text-accent-ink">
              Next unchecked →
            </Link>
          ) : null}
          <Link href={revisionsPath(pid)} className="rounded-chip border border-line px-3 py-2 hover:bg-sunken">Revisions{board.latest_revision ? ` (latest ${board.latest_revision})` : ""}</Link>
          <Link href={historyPath(pid)} className="rounded-chip border border-line px-3 py-2 hover:bg-sunken">History</Link>
        </div>
      </SectionHeader>

      <section aria-label="Check progress" className="grid gap-2">
        <p className="text-small">
          <span className="font-semibold">{counts.accepted}</span> of {counts.rows} rows accepted · <span className="text-danger">{counts.queried} queried</span> · {counts.unchecked} unchecked
        </p>
        <div className="h-2 overflow-hidden rounded-full bg-sunken" role="meter" aria-label="Rows accepted" aria-valuemin={0} aria-valuemax={100} aria-valuenow={accepted}>
          <div className="h-full bg-ok" style={{ width: `${accepted}%` }} />
        </div>
      </section>

      <div className="grid gap-4 lg:grid-cols-2">
        {canRequest ? (
          <Panel title="Ask for a check" lead="Every checker of the firm is e-mailed (unless they muted this project).">
            <RequestCheckForm projectId={pid} />
          </Panel>
        ) : null}
        {canCheck ? (
          <Panel title={`Revision ${board.next_revision}`} lead={ready ? "Every row is accepted: the schedule can be issued." : `Issuing needs every row accepted: ${counts.rows - counts.accepted} to go.`}>
            {freePlan ? <PaidOnlyNote what="Issuing a revision" isAdmin={freePlan.isAdmin} /> : <IssueRevisionForm projectId={pid} letter={board.next_revision} open={counts.rows === 0 ? 1 : counts.rows - counts.accepted} />}
          </Panel>
        ) : null}
      </div>

      <Panel
        title="Rows"
        lead={`${rows.length} shown`}
        actions={
          <nav aria-label="Filter rows" className="flex flex-wrap gap-1">
            <FilterLink projectId={pid} filter={filter} to={{ sheet: filter.sheet }}>All ({counts.rows})</FilterLink>
            {CHECK_STATES.map((s) => (
              <FilterLink key={s} projectId={pid} filter={filter} to={{ state: s, sheet: filter.sheet }}>
                {STATE_LABELS[s]} ({counts[s]})
              </FilterLink>
            ))}
            <span className="mx-1 w-px bg-line" aria-hidden />
            {(["surfaces", "duct_runs"] as const).map((sh) => (
              <FilterLink key={sh} projectId={pid} filter={filter} to={{ state: filter.state, sheet: filter.sheet === sh ? undefined : sh }}>
                {sh === "surfaces" ? "Surfaces" : "Duct runs"}
              </FilterLink>
            ))}
          </nav>
        }
      >
        {rows.length === 0 ? (
          <p className="text-small text-muted">{counts.rows === 0 ? "The schedule has no surfaces or duct runs yet." : "No row matches this filter."}</p>
        ) : (
          <div className="overflow-x-auto">
            <table className="w-full text-small">
              <thead className="text-left text-micro uppercase tracking-[0.08em] text-muted">
                <tr>
                  <th className="py-2 pr-3">Row</th>
                  <th className="py-2 pr-3">Kind</th>
                  <th className="py-2 pr-3">Zone</th>
                  <th className="py-2 pr-3">State</th>
                  <th className="py-2 pr-3">Checked by</th>
                  <th className="py-2 pr-3">Last edited by</th>
                  <th className="py-2 text-right">Comments</th>
                </tr>
              </thead>
              <tbody>
                {rows.map((r) => (
                  <tr key={`${r.sheet}:${r.id}`} className="border-t border-line/60">
                    <td className="py-1.5 pr-3">
                      <Link href={rowPath(pid, r.sheet, r.id)} className="font-medium text-accent underline-offset-2 hover:underline">
                        {r.label}
                      </Link>
                    </td>
                    <td className="py-1.5 pr-3 text-muted">{SHEET_LABELS[r.sheet]}</td>
                    <td className="py-1.5 pr-3">{r.zone}</td>
                    <td className="py-1.5 pr-3">
                      <StateBadge state={r.state} />
                    </td>
                    <td className="py-1.5 pr-3 text-muted">{r.checked_by_name ?? "—"}</td>
                    <td className="py-1.5 pr-3 text-muted">{r.last_edited_by_name ?? "—"}</td>
                    <td className="py-1.5 text-right tabular-nums">{r.comments}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
        {canCheck ? (
          <div className="mt-4 border-t border-line pt-4 empty:hidden">
            <AcceptListedForm projectId={pid} rows={acceptable.map((r) => ({ sheet: r.sheet, id: r.id, version: r.version }))} />
            {acceptable.length < rows.filter((r) => r.state !== "accepted").length ? (
              <p className="mt-2 text-micro text-muted">Rows you last edited are left out: another checker must check them.</p>
            ) : null}
          </div>
        ) : null}
      </Panel>

      <MuteForm projectId={pid} muted={muted} />
    </div>
  );
}

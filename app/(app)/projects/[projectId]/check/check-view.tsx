import { Link } from "@/components/shell/link";
import { CHECK_STATES, STATE_LABELS } from "@/checking/check-machine";
import { historyPath, revisionsPath, rowPath } from "@/checking/paths";
import { SectionHeader } from "@/components/checking/section-header";
import { Panel } from "@/components/panel";
import type { CheckBoard } from "@/server/services/get-check-board";
import { PaidOnlyNote } from "@/components/billing/paid-only-note";
import type { TBoardFilter } from "@/schemas/checking";
import { IssueRevisionForm, RequestCheckForm } from "../_checking/check-forms";
import { CheckList } from "./check-list";
import { MuteForm } from "../_checking/mute-form";
import { formatCount } from "@/units/format";

type Filter = TBoardFilter;

function filterHref(projectId: string, f: Filter): string {
  const q = new URLSearchParams(
    Object.entries(f)
      .filter(([, v]) => v !== undefined && v !== false)
      .map(([k, v]) => [k, v === true ? "yes" : String(v)]),
  ).toString();
  return `/projects/${projectId}/check${q ? `?${q}` : ""}`;
}

const same = (a: Filter, b: Filter) => a.state === b.state && a.sheet === b.sheet && !!a.warnings === !!b.warnings && !!a.changed === !!b.changed;

/** The filter in words, as the bulk accept's confirmation shows it and each row's history keeps it. */
export function filterWords(f: Filter): string {
  const parts = [f.state ? STATE_LABELS[f.state] : null, f.sheet ? (f.sheet === "surfaces" ? "Surfaces" : "Duct runs") : null, f.warnings ? "With warnings" : null, f.changed ? "Changed since accepted" : null].filter(Boolean);
  return parts.length === 0 ? "All rows" : parts.join(" · ");
}

function FilterLink({ projectId, filter, to, children }: { projectId: string; filter: Filter; to: Filter; children: React.ReactNode }) {
  const current = same(filter, to);
  return (
    <Link href={filterHref(projectId, to)} aria-current={current ? "page" : undefined} className="rounded-chip border border-line px-2 py-1 text-small hover:bg-sunken aria-[current=page]:border-accent aria-[current=page]:bg-accent-soft">
      {children}
    </Link>
  );
}

/** A filter that is on or off whatever else is chosen (warnings, changed since accepted). */
function ToggleLink({ projectId, filter, name, children }: { projectId: string; filter: Filter; name: "warnings" | "changed"; children: React.ReactNode }) {
  const on = !!filter[name];
  return (
    <Link href={filterHref(projectId, { ...filter, [name]: !on })} aria-pressed={on} role="button" className="rounded-chip border border-line px-2 py-1 text-small hover:bg-sunken aria-[pressed=true]:border-caution aria-[pressed=true]:bg-caution/10">
      {on ? "✓ " : ""}
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
        lead={`${formatCount(rows.length)} shown · filter: ${filterWords(filter)}`}
        actions={
          <nav aria-label="Filter rows" className="flex flex-wrap gap-1">
            <FilterLink projectId={pid} filter={filter} to={{ sheet: filter.sheet, warnings: filter.warnings, changed: filter.changed }}>All ({formatCount(counts.rows)})</FilterLink>
            {CHECK_STATES.map((s) => (
              <FilterLink key={s} projectId={pid} filter={filter} to={{ ...filter, state: s }}>
                {STATE_LABELS[s]} ({formatCount(counts[s])})
              </FilterLink>
            ))}
            <span className="mx-1 w-px bg-line" aria-hidden />
            {(["surfaces", "duct_runs"] as const).map((sh) => (
              <FilterLink key={sh} projectId={pid} filter={filter} to={{ ...filter, sheet: filter.sheet === sh ? undefined : sh }}>
                {sh === "surfaces" ? "Surfaces" : "Duct runs"}
              </FilterLink>
            ))}
            <span className="mx-1 w-px bg-line" aria-hidden />
            <ToggleLink projectId={pid} filter={filter} name="warnings">
              With warnings ({counts.warnings})
            </ToggleLink>
            <ToggleLink projectId={pid} filter={filter} name="changed">
              Changed since accepted ({counts.changed})
            </ToggleLink>
          </nav>
        }
      >
        <CheckList
          projectId={pid}
          canCheck={canCheck}
          filterText={filterWords(filter)}
          empty={counts.rows === 0 ? "The schedule has no surfaces or duct runs yet." : "No row matches this filter."}
          rows={rows.map((r) => ({
            sheet: r.sheet, id: r.id, label: r.label, zone: r.zone, version: r.version, state: r.state, checked_by_name: r.checked_by_name, accepted_in_bulk: r.accepted_in_bulk,
            last_edited_by_name: r.last_edited_by_name, mine: userId !== null && r.last_edited_by === userId, comments: r.comments, changed_since_accepted: r.changed_since_accepted, warnings: r.warnings,
          }))}
        />
      </Panel>

      <MuteForm projectId={pid} muted={muted} />
    </div>
  );
}

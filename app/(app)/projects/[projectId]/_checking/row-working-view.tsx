import { Link } from "@/components/shell/link";
import { CHECK_MOVES, SHEET_LABELS } from "@/checking/check-machine";
import { checkPath, rowPath, schedulePath, workingPath } from "@/checking/paths";
import { HistoryList, type HistoryItem } from "@/components/checking/history-list";
import { StateBadge } from "@/components/checking/state-badge";
import { when } from "@/components/checking/when";
import { Panel } from "@/components/panel";
import { WorkingView } from "@/components/working/working-view";
import { plainWord } from "@/report/plain-words";
import type { RowWorking } from "@/server/services/get-row-working";
import { CheckRowForm, CommentForm } from "./row-forms";
import { SinceAccepted } from "./since-accepted";
import { WorkingKeys } from "./working-keys";

const KIND_LABELS: Record<string, { label: string; tone: string }> = {
  query: { label: "Query", tone: "text-danger" },
  answer: { label: "Answer", tone: "text-accent" },
  accept: { label: "Accepted", tone: "text-ok" },
  note: { label: "Comment", tone: "text-muted" },
};

/** One row's working for one design case, with its check, thread and history alongside. */
export function RowWorkingView({ data, history, canCheck, canComment, isConsultant, isLastEditor }: { data: RowWorking; history: HistoryItem[]; canCheck: boolean; canComment: boolean; isConsultant: boolean; isLastEditor: boolean }) {
  const { project, sheet, row, check } = data;
  const key = { projectId: project.id, sheet, rowId: row.id };
  const base = rowPath(project.id, sheet, row.id);
  const dc = data.design_cases.find((d) => d.id === data.design_case_id);
  const canAccept = CHECK_MOVES.accept.from.includes(check.state);
  const canQuery = CHECK_MOVES.query.from.includes(check.state);
  return (
    <div className="grid gap-6">
      <header className="grid gap-2">
        <p className="flex flex-wrap gap-3 text-small text-muted">
          <Link href={schedulePath(project.id, sheet, data.design_case_id)} className="font-medium text-accent hover:underline">
            ← Back to the schedule ({sheet === "surfaces" ? "surfaces" : "duct runs"}{dc ? `, ${dc.name}` : ""})
          </Link>
          <span>
            <Link href={checkPath(project.id)} className="hover:underline">
              Check
            </Link>{" "}
            / {SHEET_LABELS[sheet]}
          </span>
        </p>
        <div className="flex flex-wrap items-end justify-between gap-3">
          <div>
            <h2 className="text-title font-semibold">
              {SHEET_LABELS[sheet]} {row.label}
            </h2>
            <p className="text-small text-muted">
              Zone {row.zone}
              {row.buildup ? ` · build-up ${row.buildup}` : ""} · version {row.version}
            </p>
          </div>
          <div className="flex items-center gap-3">
            <StateBadge state={check.state} />
            {data.next_unchecked ? (
              <Link href={workingPath(project.id, data.next_unchecked.sheet, data.next_unchecked.id, data.design_case_id)} className="rounded-chip border border-line px-3 py-1.5 text-small hover:bg-sunken">
                Next unchecked →
              </Link>
            ) : null}
          </div>
        </div>
        <nav aria-label="Design case" className="flex flex-wrap gap-1">
          {data.design_cases.map((d) => (
            <Link key={d.id} href={`${base}?case=${d.id}`} replace aria-current={d.id === data.design_case_id ? "page" : undefined} className="rounded-chip border border-line px-2 py-1 text-small hover:bg-sunken aria-[current=page]:border-accent aria-[current=page]:bg-accent-soft">
              {d.name} <span className="text-micro text-muted">({plainWord(d.kind)})</span>
            </Link>
          ))}
        </nav>
      </header>

      {data.since_accepted ? <SinceAccepted since={data.since_accepted} /> : null}

      <div className="grid gap-6 xl:grid-cols-[minmax(0,2fr)_minmax(18rem,1fr)]">
        <div className="min-w-0">
          {data.working && dc ? (
            <WorkingView working={data.working} title={`${row.label} — ${dc.name}`} />
          ) : (
            <p className="text-small text-muted">The project has no design case yet: add one to see this row&apos;s working.</p>
          )}
        </div>

        <aside className="grid content-start gap-4">
          <Panel title="Check" lead={check.checked_by_name ? `${check.state === "queried" ? "Queried" : "Accepted"} by ${check.checked_by_name}, ${when(check.checked_at)}${check.accepted_in_bulk ? ", in bulk from the check list" : ""}` : "Not yet checked"}>
            <div className="grid gap-3">
              <p className="text-small text-muted">Last edited by {check.last_edited_by_name ?? "nobody recorded (as first entered)"}.</p>
              {canCheck && isLastEditor ? <p className="text-small text-caution">You last edited this row, so another checker must check it.</p> : null}
              {canCheck && !isLastEditor && (canAccept || canQuery) ? <CheckRowForm row={key} version={row.version} canAccept={canAccept} canQuery={canQuery} /> : null}
              <WorkingKeys canCheck={canCheck && !isLastEditor && (canAccept || canQuery)} nextHref={data.next_unchecked ? workingPath(project.id, data.next_unchecked.sheet, data.next_unchecked.id, data.design_case_id) : null} />
            </div>
          </Panel>

          <Panel title="Thread" lead={data.comments.length === 0 ? "No comments yet" : `${data.comments.length} ${data.comments.length === 1 ? "comment" : "comments"}`}>
            <ol className="grid gap-3" aria-label="Comments">
              {data.comments.map((c) => (
                <li key={c.id} className="grid gap-0.5 text-small">
                  <p className="text-micro">
                    <span className={`font-semibold ${KIND_LABELS[c.kind]?.tone ?? ""}`}>{KIND_LABELS[c.kind]?.label ?? c.kind}</span> · {c.author_name} · {when(c.created_at)}
                    {c.row_version === null ? "" : ` · on version ${c.row_version}`}
                  </p>
                  <p className="whitespace-pre-wrap">{c.body}</p>
                </li>
              ))}
            </ol>
            {canComment ? (
              <div className="mt-3 border-t border-line pt-3">
                <CommentForm row={key} answering={isConsultant && check.state === "queried"} />
              </div>
            ) : null}
          </Panel>

          <Panel title="History of this row">
            <HistoryList entries={history} />
          </Panel>
        </aside>
      </div>
    </div>
  );
}

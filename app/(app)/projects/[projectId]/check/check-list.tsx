"use client";

import { Link } from "@/components/shell/link";
import { useRouter } from "next/navigation";
import { useActionState, useEffect, useRef, useState, useTransition } from "react";
import { CHECK_MOVES, SHEET_LABELS } from "@/checking/check-machine";
import { rowPath } from "@/checking/paths";
import { StateBadge } from "@/components/checking/state-badge";
import { FormMessage, SubmitButton, type FormState } from "@/components/forms/form-parts";
import type { BoardRow } from "@/server/services/get-check-board";
import { acceptRowsAction, checkRowAction } from "./actions";

type ActionState = FormState;

/** A row of the check board as the list shows it (who edited it reduced to "mine"). */
export type ListRow = Omit<BoardRow, "checked_at" | "last_edited_by"> & {
  /** This checker last edited the row: another checker must check it. */
  mine: boolean;
};

const keyOf = (r: { sheet: string; id: string }) => `${r.sheet}:${r.id}`;

/** Keys typed into a field are the field's, never a shortcut; Enter on a link or button is theirs. */
function typing(target: EventTarget | null, key: string): boolean {
  const el = target as HTMLElement | null;
  if (!el || !el.tagName) return false;
  if (key === "Enter" && ["A", "BUTTON", "SUMMARY"].includes(el.tagName)) return true;
  return el.isContentEditable || ["INPUT", "TEXTAREA", "SELECT"].includes(el.tagName);
}

function rowForm(projectId: string, r: ListRow, move: "accept" | "query", comment?: string): FormData {
  const f = new FormData();
  f.set("projectId", projectId);
  f.set("sheet", r.sheet);
  f.set("rowId", r.id);
  f.set("row_version", String(r.version));
  f.set("move", move);
  if (comment) f.set("comment", comment);
  return f;
}

/**
 * The check view's rows, worked from the keyboard: J or ↓ next, K or ↑ previous, Enter opens the
 * working, A accepts, Q queries (with a comment). Below them, accepting every row shown, after the
 * filter and their number are confirmed.
 */
export function CheckList({ projectId, rows, canCheck, filterText, empty }: { projectId: string; rows: ListRow[]; canCheck: boolean; filterText: string; empty: string }) {
  const router = useRouter();
  const [selected, setSelected] = useState(0);
  const [querying, setQuerying] = useState<string | null>(null);
  const [message, setMessage] = useState<ActionState>(null);
  const [pending, start] = useTransition();
  const tableRef = useRef<HTMLTableSectionElement>(null);
  const at = Math.min(selected, Math.max(0, rows.length - 1));
  const current = rows[at];

  const accept = (r: ListRow) =>
    start(async () => {
      const out = await checkRowAction(null, rowForm(projectId, r, "accept"));
      setMessage(out?.ok ? { ok: true, message: `${r.label}: accepted` } : out);
      // On to the next row: when the filter hides accepted rows, the next one takes this place.
      if (out?.ok) setSelected((i) => (rows.length > 1 && i < rows.length - 1 ? i + 1 : i));
      router.refresh();
    });

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (typing(e.target, e.key) || e.ctrlKey || e.metaKey || e.altKey || rows.length === 0 || querying !== null) return;
      const k = e.key;
      if (k === "j" || k === "J" || k === "ArrowDown") setSelected((i) => Math.min(rows.length - 1, i + 1));
      else if (k === "k" || k === "K" || k === "ArrowUp") setSelected((i) => Math.max(0, i - 1));
      else if (k === "Enter" && current) router.push(rowPath(projectId, current.sheet, current.id));
      else if ((k === "a" || k === "A") && canCheck && current && !current.mine && CHECK_MOVES.accept.from.includes(current.state) && !pending) accept(current);
      else if ((k === "q" || k === "Q") && canCheck && current && !current.mine && CHECK_MOVES.query.from.includes(current.state)) setQuerying(keyOf(current));
      else return;
      e.preventDefault();
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  });

  useEffect(() => {
    tableRef.current?.querySelector<HTMLElement>("[aria-selected=true]")?.scrollIntoView({ block: "nearest" });
  }, [at]);

  const acceptable = rows.filter((r) => CHECK_MOVES.accept.from.includes(r.state) && !r.mine);
  return (
    <div className="grid gap-3">
      <p className="text-micro text-muted" aria-label="Keyboard">
        Keys: <Kbd>J</Kbd> or <Kbd>↓</Kbd> next · <Kbd>K</Kbd> or <Kbd>↑</Kbd> previous · <Kbd>Enter</Kbd> open the working
        {canCheck ? (
          <>
            {" "}
            · <Kbd>A</Kbd> accept · <Kbd>Q</Kbd> query
          </>
        ) : null}
      </p>
      {rows.length === 0 ? <p className="text-small text-muted">{empty}</p> : null}
      <div className={`overflow-x-auto ${rows.length === 0 ? "hidden" : ""}`}>
        <table className="w-full text-small" aria-label="Rows to check">
          <thead className="text-left text-micro uppercase tracking-[0.08em] text-muted">
            <tr>
              <th className="py-2 pr-3">Row</th>
              <th className="py-2 pr-3">Kind</th>
              <th className="py-2 pr-3">Zone</th>
              <th className="py-2 pr-3">State</th>
              <th className="py-2 pr-3">Warnings</th>
              <th className="py-2 pr-3">Checked by</th>
              <th className="py-2 pr-3">Last edited by</th>
              <th className="py-2 text-right">Comments</th>
            </tr>
          </thead>
          <tbody ref={tableRef}>
            {rows.map((r, i) => (
              <RowLine key={keyOf(r)} r={r} projectId={projectId} selected={i === at} onSelect={() => setSelected(i)} querying={querying === keyOf(r)} onQueryDone={(m) => {
                setQuerying(null);
                if (m) setMessage(m);
                router.refresh();
              }} />
            ))}
          </tbody>
        </table>
      </div>
      <div aria-live="polite">{pending ? <p className="text-small text-muted">Saving…</p> : <FormMessage state={message} />}</div>
      {canCheck ? <BulkAccept projectId={projectId} rows={acceptable} shown={rows.length} filterText={filterText} /> : null}
    </div>
  );
}

function Kbd({ children }: { children: React.ReactNode }) {
  return <kbd className="rounded border border-line bg-sunken px-1 font-sans text-micro text-ink">{children}</kbd>;
}

function RowLine({ r, projectId, selected, onSelect, querying, onQueryDone }: { r: ListRow; projectId: string; selected: boolean; onSelect: () => void; querying: boolean; onQueryDone: (m: ActionState) => void }) {
  return (
    <>
      <tr aria-selected={selected} onClick={onSelect} className={`border-t border-line/60 ${selected ? "bg-accent-soft outline outline-1 outline-accent" : ""}`}>
        <td className="py-1.5 pr-3">
          <Link href={rowPath(projectId, r.sheet, r.id)} className="font-medium text-accent underline-offset-2 hover:underline">
            {r.label}
          </Link>
          {r.changed_since_accepted ? <span className="ml-2 rounded-chip border border-caution/50 px-1.5 text-micro text-caution">changed since accepted</span> : null}
        </td>
        <td className="py-1.5 pr-3 text-muted">{SHEET_LABELS[r.sheet]}</td>
        <td className="py-1.5 pr-3">{r.zone}</td>
        <td className="py-1.5 pr-3">
          <StateBadge state={r.state} />
        </td>
        <td className="py-1.5 pr-3 text-caution" title={r.warnings.join("\n") || undefined}>
          {r.warnings.length === 0 ? <span className="text-muted">—</span> : `${r.warnings.length} ${r.warnings.length === 1 ? "warning" : "warnings"}`}
        </td>
        <td className="py-1.5 pr-3 text-muted">
          {r.checked_by_name ?? "—"}
          {r.accepted_in_bulk ? " (in bulk)" : ""}
        </td>
        <td className="py-1.5 pr-3 text-muted">{r.last_edited_by_name ?? "—"}</td>
        <td className="py-1.5 text-right tabular-nums">{r.comments}</td>
      </tr>
      {querying ? (
        <tr>
          <td colSpan={8} className="pb-3">
            <QueryBox projectId={projectId} r={r} onDone={onQueryDone} />
          </td>
        </tr>
      ) : null}
    </>
  );
}

/** A query from the keyboard: the comment is required; Escape closes it without querying. */
function QueryBox({ projectId, r, onDone }: { projectId: string; r: ListRow; onDone: (m: ActionState) => void }) {
  const [state, run] = useActionState(async (_prev: ActionState, form: FormData): Promise<ActionState> => {
    const out: ActionState = await checkRowAction(null, form);
    if (out?.ok) onDone({ ok: true, message: `${r.label}: queried` });
    return out;
  }, null);
  return (
    <form action={run} aria-label={`Query ${r.label}`} className="grid gap-2 rounded-chip border border-danger/40 bg-surface p-3" onKeyDown={(e) => e.key === "Escape" && onDone(null)}>
      {[["projectId", projectId], ["sheet", r.sheet], ["rowId", r.id], ["row_version", String(r.version)], ["move", "query"]].map(([n, v]) => (
        <input key={n} type="hidden" name={n} value={v} />
      ))}
      <label className="grid gap-1 text-small">
        <span className="font-medium">What should the engineer look at in {r.label}?</span>
        <textarea name="comment" required autoFocus rows={2} maxLength={4000} className="rounded-chip border border-line bg-surface px-2 py-1" />
      </label>
      <div className="flex gap-2">
        <SubmitButton tone="danger">Send query</SubmitButton>
        <button type="button" className="rounded-chip border border-line px-3 py-2 text-small" onClick={() => onDone(null)}>
          Cancel (Esc)
        </button>
      </div>
      <FormMessage state={state} />
    </form>
  );
}

/**
 * Accepting every row shown takes two steps: the button names the count, then the checker
 * confirms "Accept 37 rows shown by filter …?". The count and the filter go with the rows; the
 * server refuses a count that is not the number of rows sent.
 */
function BulkAccept({ projectId, rows, shown, filterText }: { projectId: string; rows: ListRow[]; shown: number; filterText: string }) {
  const [state, run] = useActionState(acceptRowsAction, null);
  const [confirming, setConfirming] = useState(false);
  useEffect(() => setConfirming(false), [state]);
  const n = rows.length;
  const noun = n === 1 ? "row" : "rows";
  const left = shown - n;
  return (
    <div className="grid gap-2 border-t border-line pt-4">
      {n > 0 && !confirming ? (
        <div>
          <button type="button" className="rounded-chip border border-line bg-surface px-3 py-2 text-small font-semibold hover:bg-sunken" onClick={() => setConfirming(true)}>
            Accept the {n} {noun} shown…
          </button>
          {left > 0 ? <p className="mt-1 text-micro text-muted">{left} of the {shown} rows shown are left out: already accepted, or last edited by you (another checker must check those).</p> : null}
        </div>
      ) : null}
      {n > 0 && confirming ? (
        <form action={run} role="alertdialog" aria-label="Confirm accepting the rows shown" aria-describedby="bulk-question" className="grid gap-3 rounded-panel border border-accent bg-accent-soft p-4">
          <input type="hidden" name="projectId" value={projectId} />
          <input type="hidden" name="filter" value={filterText} />
          <input type="hidden" name="confirmed_count" value={n} />
          {rows.map((r) => (
            <input key={keyOf(r)} type="hidden" name="rows[]" value={`${r.sheet}:${r.id}:${r.version}`} />
          ))}
          <p id="bulk-question" className="text-body font-semibold">
            Accept {n} {noun} shown by filter “{filterText}”?
          </p>
          <p className="text-small text-muted">Each is recorded as accepted by you in bulk, with this filter, in its history. Accept only rows whose working you have read.</p>
          <div className="flex gap-2">
            <SubmitButton>
              Accept {n} {noun}
            </SubmitButton>
            <button type="button" className="rounded-chip border border-line bg-surface px-3 py-2 text-small" onClick={() => setConfirming(false)}>
              Cancel
            </button>
          </div>
        </form>
      ) : null}
      <FormMessage state={state} />
    </div>
  );
}

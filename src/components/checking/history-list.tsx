import { fieldChanges } from "@/checking/compare-revisions";
import { describeItemChange } from "@/checking/describe-input-changes";
import type { THistoryEntry } from "@/checking/history-entry";
import { when } from "./when";

export type HistoryItem = THistoryEntry;

const NOUNS: Record<string, string> = {
  surfaces: "surface",
  duct_runs: "duct run",
  zones: "zone",
  buildups: "build-up",
  design_cases: "design case",
  project: "project",
  row_check: "check",
  row_comment: "comment",
  revision: "revision",
};

const show = (v: unknown) => (v === null || v === undefined ? "blank" : typeof v === "object" ? JSON.stringify(v) : String(v));
const nameOf = (e: HistoryItem) => String((e.after ?? e.before)?.label ?? (e.after ?? e.before)?.name ?? "");

/** One audit row in words: what happened to what, and the values that changed. */
export function describeEntry(e: HistoryItem): { title: string; details: string[] } {
  const noun = NOUNS[e.entity] ?? e.entity;
  const name = nameOf(e);
  const quoted = (s: unknown) => (typeof s === "string" && s ? `: “${s}”` : "");
  switch (e.action) {
    case "create":
      return { title: `Added ${noun} ${name}`.trim(), details: [] };
    case "delete":
      return { title: `Deleted ${noun} ${name}`.trim(), details: [] };
    case "update": {
      // Fields by their headings and values with units; an unknown item keeps the stored names.
      const words = describeItemChange(e.entity, e.before ?? {}, e.after ?? {});
      const details = words ?? fieldChanges(e.before ?? {}, e.after ?? {}).filter((f) => f.field !== "updated_at").map((f) => `${f.field}: ${show(f.before)} → ${show(f.after)}`);
      return { title: `Changed ${noun} ${name}`.trim(), details };
    }
    case "accept": {
      // Accepted from the check list with others: the filter and the number the checker confirmed.
      const bulk = e.after?.bulk as { rows?: number; filter?: string } | undefined;
      if (bulk) return { title: `Accepted ${name} in bulk`.replace("  ", " "), details: [`one of ${bulk.rows ?? "several"} rows shown by the filter “${bulk.filter ?? ""}”, accepted together`] };
      return { title: `Accepted ${name}`.trim() + quoted(e.after?.comment), details: [] };
    }
    case "query":
      return { title: `Queried ${name}`.trim() + quoted(e.after?.comment), details: [] };
    case "reset":
      return { title: `Check reset to unchecked (was ${show(e.before?.state)})`, details: [String(e.after?.reason ?? "")] };
    case "answer":
      return { title: `Answered the query on ${name}`.trim() + quoted(e.after?.body), details: [] };
    case "note":
      return { title: `Commented on ${name}`.trim() + quoted(e.after?.body), details: [] };
    case "request_check":
      return { title: "Asked for a check" + quoted(e.after?.message), details: [] };
    case "issue":
      return { title: `Issued revision ${show(e.after?.letter)}` + quoted(e.after?.note), details: [] };
    default:
      return { title: `${e.action} ${noun} ${name}`.trim(), details: [] };
  }
}

/** An audit trail, newest first: when, who, what. */
export function HistoryList({ entries, empty = "Nothing recorded yet." }: { entries: HistoryItem[]; empty?: string }) {
  if (entries.length === 0) return <p className="text-small text-muted">{empty}</p>;
  return (
    <ol className="grid gap-2 text-small" aria-label="History entries">
      {entries.map((e) => {
        const d = describeEntry(e);
        return (
          <li key={e.id} className="border-l-2 border-line pl-3">
            <p>
              <span className="font-medium">{d.title}</span>
            </p>
            {d.details.filter(Boolean).length > 0 ? (
              <ul className="font-mono text-micro text-muted">
                {d.details.filter(Boolean).map((x) => (
                  <li key={x}>{x}</li>
                ))}
              </ul>
            ) : null}
            <p className="text-micro text-muted">
              {e.actor_name} · <time dateTime={e.at}>{when(e.at)}</time>
            </p>
          </li>
        );
      })}
    </ol>
  );
}

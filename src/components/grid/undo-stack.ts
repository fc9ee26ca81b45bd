/**
 * Undo and redo of the schedule's row writes. Each step is one set of bulk changes (an edit, a
 * whole paste, fill or clear, added or deleted rows) with the changes that reverse it, worked out
 * from the rows as they were just before. Undoing sends the reverse as one version-guarded bulk
 * write, so a row someone else changed meanwhile refuses it (409) instead of being overwritten.
 */
import type { TSheet } from "@/schemas/schedule";
import type { Row } from "@/components/schedule/schedule-cache";
import type { BulkOp } from "@/components/schedule/use-schedule-writes";

export interface UndoStep {
  /** What the step did, for the buttons' titles and the notices: "Paste of 3 lines". */
  label: string;
  forward: BulkOp[];
  backward: BulkOp[];
}

const LIMIT = 100;

/** The changes that put back what `ops` change, in reverse order; rows read as they were before. */
export function reverseOps(ops: readonly BulkOp[], before: (sheet: TSheet, id: string) => Row | undefined): BulkOp[] {
  const out: BulkOp[] = [];
  for (const o of [...ops].reverse()) {
    if (o.op === "create") out.push({ op: "delete", sheet: o.sheet, id: o.row.id });
    else if (o.op === "update") {
      const row = before(o.sheet, o.id);
      if (!row) throw new Error(`Row ${o.id} is not in the schedule`);
      out.push({ op: "update", sheet: o.sheet, id: o.id, values: Object.fromEntries(Object.keys(o.values).map((k) => [k, row[k] ?? null])) });
    } else {
      const row = before(o.sheet, o.id);
      if (!row) throw new Error(`Row ${o.id} is not in the schedule`);
      out.push({ op: "create", sheet: o.sheet, row: { ...row } });
    }
  }
  return out;
}

/**
 * The two stacks. `take` removes the step being undone or redone while its write is out; `settle`
 * files it on the other stack when the write succeeded, drops it when the server refused it for
 * good (a conflict or a check: it can never apply), or puts it back to try again (a network fault).
 */
export class UndoStack {
  private past: UndoStep[] = [];
  private future: UndoStep[] = [];

  record(step: UndoStep): void {
    this.past = [...this.past, step].slice(-LIMIT);
    this.future = [];
  }

  /** Removes a step whose own first write failed (nothing to undo). */
  forget(step: UndoStep): void {
    this.past = this.past.filter((s) => s !== step);
    this.future = this.future.filter((s) => s !== step);
  }

  take(kind: "undo" | "redo"): UndoStep | undefined {
    return kind === "undo" ? this.past.pop() : this.future.pop();
  }

  settle(kind: "undo" | "redo", step: UndoStep, outcome: "done" | "dropped" | "retry"): void {
    const [from, to] = kind === "undo" ? [this.past, this.future] : [this.future, this.past];
    if (outcome === "done") to.push(step);
    else if (outcome === "retry") from.push(step);
  }

  peek(kind: "undo" | "redo"): UndoStep | undefined {
    return kind === "undo" ? this.past.at(-1) : this.future.at(-1);
  }

  get sizes() {
    return { undo: this.past.length, redo: this.future.length };
  }
}

/** The ops of a step as sent: update and delete carry the version this browser last wrote. */
export function guarded(ops: readonly BulkOp[], known: (id: string) => number | undefined): BulkOp[] {
  return ops.map((o) => (o.op === "create" ? o : { ...o, version: known(o.id) }));
}

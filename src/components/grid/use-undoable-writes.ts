"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useCallback, useRef, useState } from "react";
import type { TSchedule, TSheet } from "@/schemas/schedule";
import { SHEET_COLUMNS } from "@/schedule/sheet-columns";
import { ApiError } from "@/components/schedule/api-client";
import { findRow, type Row } from "@/components/schedule/schedule-cache";
import { scheduleKey, useProject } from "@/components/schedule/schedule-context";
import { useScheduleWrites, type BulkOp, type WriteResult } from "@/components/schedule/use-schedule-writes";
import { UndoStack, guarded, reverseOps, type UndoStep } from "./undo-stack";

/** Messages of a refused write, by row and column where the server named them. */
export function explain(error: unknown, rows: (sheet: TSheet, id: string) => Row | undefined): string[] {
  if (!(error instanceof ApiError)) return [];
  return error.details.map((d) => {
    const sheet = (d.sheet === "duct_runs" ? "duct_runs" : "surfaces") as TSheet;
    const col = SHEET_COLUMNS[sheet].find((c) => c.field === d.field);
    const row = d.id ? rows(sheet, d.id) : undefined;
    const label = row ? String(row.label) : d.current?.label ? String(d.current.label) : d.row ? `Change ${d.row}` : "";
    return `${label}${col ? ` · ${col.title}` : ""}: ${d.message}`;
  });
}

type Step = UndoStep & { pending: Promise<unknown> };

/**
 * Bulk writes of the sheets that can be undone and redone, one step per write. The versions this
 * browser wrote are remembered per row: an undo or redo sends them as its guard, so it applies
 * only to rows nobody else has written since (else the server answers 409, and the step is
 * dropped with a message saying so). Notices carry a key, so a new one replaces the last of its
 * kind instead of stacking.
 */
export function useUndoableWrites(onWritten: (ops: BulkOp[]) => void) {
  const { projectId, notify, dismiss } = useProject();
  const { bulk } = useScheduleWrites();
  const qc = useQueryClient();
  const stack = useRef(new UndoStack()).current;
  const known = useRef(new Map<string, number>()).current;
  const chain = useRef<Promise<unknown>>(Promise.resolve());
  const [, setTick] = useState(0);
  const bump = () => setTick((t) => t + 1);
  const cached = (sheet: TSheet, id: string) => findRow(qc.getQueryData<TSchedule>(scheduleKey(projectId)), sheet, id);

  const remember = (ops: BulkOp[], result: WriteResult) => {
    for (const r of [...result.created, ...result.updated]) known.set(r.row.id, r.row.version);
    for (const o of ops) if (o.op === "delete") known.delete(o.id);
    onWritten(ops);
  };

  const refusal = (error: unknown, lead: string, key: string) => {
    const conflict = error instanceof ApiError && error.status === 409;
    const message = error instanceof Error ? error.message : String(error);
    notify({ key, tone: "error", message: `${lead}${message}${conflict ? ". The grid now shows the current values." : ""}`, lines: explain(error, cached) });
  };

  /** Sends `ops` as one step; `done` is the confirmation (null: none), `key` the notice's kind. */
  const write = useCallback(
    (ops: BulkOp[], label: string, done: string | null, key: string) => {
      let backward: BulkOp[];
      try {
        backward = reverseOps(ops, cached);
      } catch (error) {
        // A row gone from this browser's copy (deleted in another tab or by a refused write).
        notify({ key, tone: "error", message: `${error instanceof Error ? error.message : String(error)}; nothing was saved` });
        return Promise.resolve();
      }
      const step = { label, forward: ops, backward } as Step;
      step.pending = bulk.mutateAsync(ops).then(
        (result) => {
          remember(ops, result);
          dismiss(key);
          if (done) notify({ key: "sheet-ok", tone: "ok", message: done });
        },
        (error) => {
          stack.forget(step);
          bump();
          refusal(error, "", key);
        },
      );
      stack.record(step);
      bump();
      return step.pending;
    },
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [bulk, notify, dismiss],
  );

  const replay = (kind: "undo" | "redo") => {
    chain.current = chain.current.then(async () => {
      // A step whose own write is still out is waited for: its versions are known only then.
      await (stack.peek(kind) as Step | undefined)?.pending;
      const step = stack.take(kind) as Step | undefined;
      if (!step) return notify({ key: "undo", tone: "ok", message: kind === "undo" ? "Nothing to undo" : "Nothing to redo" });
      const ops = guarded(kind === "undo" ? step.backward : step.forward, (id) => known.get(id));
      const verb = kind === "undo" ? "Undone" : "Redone";
      step.pending = bulk.mutateAsync(ops).then(
        (result) => {
          remember(ops, result);
          stack.settle(kind, step, "done");
          notify({ key: "undo", tone: "ok", message: `${verb}: ${step.label}` });
        },
        (error) => {
          // A conflict or a refused check can never apply: the step goes. A network fault may pass.
          const final = error instanceof ApiError && error.status >= 400 && error.status < 500;
          stack.settle(kind, step, final ? "dropped" : "retry");
          refusal(error, `Could not ${kind} "${step.label}": `, "undo");
        },
      );
      await step.pending;
      bump();
    });
    bump();
  };

  const past = stack.peek("undo");
  const next = stack.peek("redo");
  return {
    write,
    undo: () => replay("undo"),
    redo: () => replay("redo"),
    /** What Undo and Redo would do now, for the buttons. */
    undoLabel: past?.label ?? null,
    redoLabel: next?.label ?? null,
    pending: bulk.isPending,
  };
}

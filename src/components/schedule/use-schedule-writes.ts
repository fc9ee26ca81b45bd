"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRef } from "react";
import type { TSchedule, TSheet } from "@/schemas/schedule";
import { ApiError, ITEM_PATHS, api } from "./api-client";
import { findRow, mergeRows, pick, removeRows, upsertRows, type Row } from "./schedule-cache";
import { scheduleKey, useProject } from "./schedule-context";
import { afterNextPaint } from "./use-after-paint";

/** Update and delete read the row's cached version when sent, unless they name one (an undo names the version this browser last wrote). */
export type BulkOp =
  | { op: "create"; sheet: TSheet; row: Row }
  | { op: "update"; sheet: TSheet; id: string; values: Record<string, unknown>; version?: number }
  | { op: "delete"; sheet: TSheet; id: string; version?: number };

export interface WriteResult {
  created: { sheet: TSheet; row: Row }[];
  updated: { sheet: TSheet; row: Row }[];
}

const META = new Set(["id", "version", "position"]);
const fieldsOf = (row: Row) => Object.fromEntries(Object.entries(row).filter(([k]) => !META.has(k)));

/**
 * Writes of the schedule's sheets with optimistic updates: the cache changes at once (so the
 * browser recalculates at once), the request goes out in order behind earlier writes of this
 * project (each reads the row's latest version when it is sent), and a refusal puts back exactly
 * what it changed — or, on a 409, the row as the server now has it.
 */
export function useScheduleWrites() {
  const { projectId } = useProject();
  const qc = useQueryClient();
  const key = scheduleKey(projectId);
  // One queue per project: a write never races an earlier one for the same row's version.
  const scope = { id: `schedule-writes:${projectId}` };
  const get = () => qc.getQueryData<TSchedule>(key);
  const set = (f: (s: TSchedule) => TSchedule) => qc.setQueryData<TSchedule>(key, (s) => (s ? f(s) : s));
  const inFlight = useRef(new Map<string, number>());
  const track = (ids: string[], d: 1 | -1) => ids.forEach((id) => inFlight.current.set(id, (inFlight.current.get(id) ?? 0) + d));
  // A delete takes its row out of the cache at once (onMutate runs before the request is built):
  // its version is kept here until the request is sent.
  const deleting = useRef(new Map<string, number>());
  const version = (sheet: TSheet, id: string) => {
    const row = findRow(get(), sheet, id) ?? (deleting.current.has(id) ? { version: deleting.current.get(id)! } : undefined);
    if (!row) throw new ApiError(404, "not_found", "That row is no longer in the schedule");
    return row.version;
  };
  /** Rows the server says are current (409) replace ours; rows it says are gone leave. */
  const acceptCurrent = (error: unknown) => {
    if (!(error instanceof ApiError) || error.status !== 409) return;
    for (const d of error.details) {
      const sheet = d.sheet as TSheet;
      if (!d.id || (sheet !== "surfaces" && sheet !== "duct_runs")) continue;
      set((s) => (d.current ? upsertRows(s, sheet, [d.current as Row]) : removeRows(s, sheet, new Set([d.id!]))));
    }
  };

  const bulk = useMutation({
    scope,
    // Sent once the browser has painted the edit (the optimistic row and its zone): building and
    // sending the request (≈ 5–8 ms on a 5,000-row sheet) does not stand between the key and its
    // result on screen. The queue's order is kept (the scope waits for this function).
    mutationFn: async (ops: BulkOp[]) => {
      await afterNextPaint();
      return api<WriteResult>("POST", `/api/projects/${projectId}/bulk`, {
        changes: ops.map((o) =>
          o.op === "create"
            ? { op: "create", sheet: o.sheet, id: o.row.id, values: fieldsOf(o.row) }
            : o.op === "update"
              ? { op: "update", sheet: o.sheet, id: o.id, version: o.version ?? version(o.sheet, o.id), values: o.values }
              : { op: "delete", sheet: o.sheet, id: o.id, version: o.version ?? version(o.sheet, o.id) },
        ),
      });
    },
    onMutate: async (ops) => {
      await qc.cancelQueries({ queryKey: key });
      const before = get();
      const undo: BulkOp[] = [];
      const removed: { sheet: TSheet; row: Row }[] = [];
      for (const o of ops) {
        if (o.op === "update") undo.push({ ...o, values: pick(findRow(before, o.sheet, o.id) ?? {}, Object.keys(o.values)) });
        if (o.op === "delete") {
          const row = findRow(before, o.sheet, o.id);
          removed.push({ sheet: o.sheet, row: row! });
          if (row) deleting.current.set(o.id, row.version);
        }
      }
      track(ops.map((o) => (o.op === "create" ? o.row.id : o.id)), 1);
      set((s) => {
        let next = s;
        for (const o of ops) {
          if (o.op === "create") next = upsertRows(next, o.sheet, [o.row]);
          else if (o.op === "update") next = mergeRows(next, o.sheet, [{ id: o.id, values: o.values }]);
          else next = removeRows(next, o.sheet, new Set([o.id]));
        }
        return next;
      });
      return { undo, removed };
    },
    onError: (error, ops, ctx) => {
      set((s) => {
        let next = s;
        for (const o of ops) if (o.op === "create") next = removeRows(next, o.sheet, new Set([o.row.id]));
        for (const o of ctx?.undo ?? []) if (o.op === "update") next = mergeRows(next, o.sheet, [{ id: o.id, values: o.values }]);
        for (const r of ctx?.removed ?? []) if (r.row) next = upsertRows(next, r.sheet, [r.row]);
        return next;
      });
      acceptCurrent(error);
    },
    onSuccess: (result) => {
      set((s) => {
        let next = s;
        for (const c of result.created) next = upsertRows(next, c.sheet, [c.row]);
        for (const u of result.updated) {
          // While a later edit of the row is still queued, keep its optimistic values: take the version only.
          const busy = (inFlight.current.get(u.row.id) ?? 0) > 1;
          next = mergeRows(next, u.sheet, [{ id: u.row.id, values: busy ? { version: u.row.version } : u.row }]);
        }
        return next;
      });
    },
    onSettled: (_r, _e, ops) => {
      for (const o of ops) if (o.op === "delete") deleting.current.delete(o.id);
      track(ops.map((o) => (o.op === "create" ? o.row.id : o.id)), -1);
    },
  });

  /** A form's save of a design case, zone or build-up (no optimism: the form waits and shows field errors). */
  const item = useMutation({
    scope,
    mutationFn: async (v: { table: "design_cases" | "zones" | "buildups"; op: "create" | "update" | "delete"; id?: string; values?: Record<string, unknown> }) => {
      const base = `/api/projects/${projectId}/${ITEM_PATHS[v.table]}`;
      if (v.op === "create") return api<Row>("POST", base, v.values);
      const current = findRow(get(), v.table, v.id!);
      if (v.op === "update") return api<Row>("PATCH", `${base}/${v.id}`, { version: current?.version, ...v.values });
      await api("DELETE", `${base}/${v.id}?version=${current?.version}`);
      return null;
    },
    onSuccess: (row, v) => set((s) => (row ? upsertRows(s, v.table, [row]) : removeRows(s, v.table, new Set([v.id!])))),
    onError: (error, v) => {
      if (error instanceof ApiError && error.status === 409 && error.details[0]?.current) set((s) => upsertRows(s, v.table, [error.details[0]!.current as Row]));
    },
  });

  const project = useMutation({
    scope,
    mutationFn: (values: Record<string, unknown>) => api<TSchedule["project"]>("PATCH", `/api/projects/${projectId}`, { version: get()?.project.version, ...values }),
    onSuccess: (p) => set((s) => ({ ...s, project: p })),
    onError: (error) => {
      if (error instanceof ApiError && error.status === 409 && error.details[0]?.current) set((s) => ({ ...s, project: error.details[0]!.current as unknown as TSchedule["project"] }));
    },
  });

  return { bulk, item, project, refresh: () => qc.invalidateQueries({ queryKey: key }) };
}

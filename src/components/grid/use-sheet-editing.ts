"use client";

import { useCallback, useRef, useState } from "react";
import type { TSchedule, TSheet } from "@/schemas/schedule";
import { SHEET_COLUMNS, SHEET_TITLES, columnHeader } from "@/schedule/sheet-columns";
import type { Row } from "@/components/schedule/schedule-cache";
import { useProject } from "@/components/schedule/schedule-context";
import type { BulkOp } from "@/components/schedule/use-schedule-writes";
import { editCell, withRowSchemas } from "./cell-edits";
import { cellKey } from "./grid-context";
import { planPaste, readBlock } from "./paste-block";
import { problemLine, type RangePlan } from "./range-edits";
import { useUndoableWrites } from "./use-undoable-writes";
import type { PasteRequest } from "./schedule-grid";

const newId = () => crypto.randomUUID();

/** A row to start from when the sheet is empty: the first zone and build-up, ordinary values. */
function blankRow(sheet: TSheet, s: TSchedule): Row | null {
  const zone = s.zones[0];
  if (!zone) return null;
  if (sheet === "surfaces") {
    const b = s.buildups[0];
    if (!b) return null;
    return { id: newId(), version: 0, position: Number.MAX_SAFE_INTEGER, label: "New surface", zone_id: zone.id, buildup_id: b.id, area_m2: 10, tilt_deg: 90, azimuth_deg: 180, height_m: 1.5, length_m: 4, panel_height_m: 3, method: null, absorptance: null, emissivity: null, exposed_to: "outside_air" };
  }
  return {
    id: newId(), version: 0, position: Number.MAX_SAFE_INTEGER, label: "New duct run", zone_id: zone.id, shape: "round", diameter_m: 0.3, width_m: null, height_m: null, length_m: 10, flow_m3_s: 0.3,
    T_entering_heating_C: 30, T_entering_cooling_C: 14, location: "indoor", T_surround_C: 18, T_surround_cooling_C: null, RH_surround_pct: null, elevation_m: null, insulation_thickness_m: 0.025, insulation_k_W_mK: 0.035, jacket_emissivity: 0.9, jacket_absorptance: null, margin_K: 0, in_served_zone: false,
  };
}

/**
 * Typing, pasting, filling, clearing, adding, duplicating and deleting rows of one sheet, with
 * cell-level errors; every write is one step of undo and redo (useUndoableWrites).
 */
export function useSheetEditing(sheet: TSheet, schedule: TSchedule) {
  const { system, notify, dismiss } = useProject();
  const [cellErrors, setCellErrors] = useState(() => new Map<string, string>());
  // The cell the last refused edit's notice is about: saving that cell takes the notice away.
  const noticeCell = useRef<string | null>(null);
  const rows = (sheet === "surfaces" ? schedule.surfaces : schedule.duct_runs) as unknown as Row[];

  // A cell saved by any write (typing, paste, fill, clear, undo) loses its error outline and message.
  const onWritten = useCallback(
    (ops: BulkOp[]) => {
      const saved = ops.flatMap((o) => (o.op === "update" ? Object.keys(o.values).map((f) => cellKey(o.id, f)) : []));
      setCellErrors((m) => {
        if (!saved.some((k) => m.has(k))) return m;
        const next = new Map(m);
        for (const k of saved) next.delete(k);
        return next;
      });
      if (noticeCell.current && saved.includes(noticeCell.current)) {
        dismiss("edit");
        noticeCell.current = null;
      }
    },
    [dismiss],
  );
  const history = useUndoableWrites(onWritten);
  const send = (ops: BulkOp[], label: string, done: string | null, key = "sheet-error") => history.write(ops, label, done, key);

  const setError = (key: string, message: string) => setCellErrors((m) => new Map(m).set(key, message));

  // Edits are checked in the browser before they are sent, with the schemas the server uses: the
  // grid loads those once it has all its rows (an edit made before waits for them).
  const checked = (write: () => void) =>
    withRowSchemas(write, () => notify({ key: "edit", tone: "error", message: "Not saved — the checks for an edit could not be loaded (is the connection down?); try again" }));

  const onEdit = (row: Row, field: string, shown: unknown) => checked(() => editOne(row, field, shown));
  const editOne = (row: Row, field: string, shown: unknown) => {
    const col = SHEET_COLUMNS[sheet].find((c) => c.field === field);
    if (!col) return;
    const out = editCell(sheet, row, col, shown, system);
    const key = cellKey(row.id, field);
    if (!out.ok) {
      setError(key, out.message);
      noticeCell.current = key;
      notify({ key: "edit", tone: "error", message: `Not saved — ${String(row.label)} · ${columnHeader(col, system)}: ${out.message}` });
      return;
    }
    send([{ op: "update", sheet, id: row.id, values: out.values }], `Edit of ${columnHeader(col, system)} in ${String(row.label)}`, null, "edit");
  };

  const refuse = (what: string, lines: string[], noun: [string, string] = ["problem", "problems"]) =>
    notify({ key: "sheet-error", tone: "error", message: `${what}: ${lines.length} ${lines.length === 1 ? noun[0] : noun[1]}; nothing was saved`, lines });

  const onPaste = (p: PasteRequest) => checked(() => pasteBlock(p));
  const pasteBlock = (p: PasteRequest) => {
    const plan = planPaste({ ...p, sheet, system, lookups: { zones: schedule.zones, buildups: schedule.buildups }, newId });
    if (plan.problems.length) return refuse("Nothing pasted", plan.problems.map((x) => `Line ${x.line}${x.row ? ` (${x.row})` : ""} · ${x.column}: ${x.message}`), ["cell needs fixing", "cells need fixing"]);
    const lines = readBlock(p.text).length;
    const what = `${lines} ${lines === 1 ? "line" : "lines"}`;
    send(plan.ops, `Paste of ${what}`, `Pasted ${what} into ${SHEET_TITLES[sheet]}`);
  };

  /** A fill or clear, planned when the checks are loaded: one step, or the refusal naming each cell. */
  const applyRange = (planned: () => RangePlan, label: string, refused: string) => checked(() => applyPlan(planned(), label, refused));
  const applyPlan = (plan: RangePlan, label: string, refused: string) => {
    if (plan.problems.length) return refuse(refused, plan.problems.map(problemLine));
    if (plan.ops.length === 0) return notify({ key: "sheet-ok", tone: "ok", message: `${label}: nothing to change` });
    send(plan.ops, `${label} (${plan.cells} ${plan.cells === 1 ? "cell" : "cells"})`, null);
  };

  const addRow = () => {
    const last = rows[rows.length - 1];
    const row = last ? { ...last, id: newId(), version: 0, position: Number.MAX_SAFE_INTEGER, label: `${String(last.label)} (new)` } : blankRow(sheet, schedule);
    if (!row) return notify({ tone: "error", message: "Add a zone (and for surfaces a build-up) first: every row belongs to one" });
    send([{ op: "create", sheet, row }], "Added row", null);
  };

  const duplicate = (ids: string[]) =>
    send(
      rows.filter((r) => ids.includes(r.id)).map((r, i) => ({ op: "create" as const, sheet, row: { ...r, id: newId(), version: 0, position: Number.MAX_SAFE_INTEGER - ids.length + i, label: `${String(r.label)} (copy)` } })),
      `Duplicate of ${ids.length} ${ids.length === 1 ? "row" : "rows"}`,
      `Duplicated ${ids.length} ${ids.length === 1 ? "row" : "rows"}`,
    );

  const remove = (ids: string[]) => send(ids.map((id) => ({ op: "delete" as const, sheet, id })), `Delete of ${ids.length} ${ids.length === 1 ? "row" : "rows"}`, `Deleted ${ids.length} ${ids.length === 1 ? "row" : "rows"}`);

  return { cellErrors, onEdit, onPaste, applyRange, addRow, duplicate, remove, pending: history.pending, undo: history.undo, redo: history.redo, undoLabel: history.undoLabel, redoLabel: history.redoLabel };
}

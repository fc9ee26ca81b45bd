"use client";

import { useCallback, useState } from "react";
import type { TSchedule, TSheet } from "@/schemas/schedule";
import { SHEET_COLUMNS, SHEET_TITLES, columnHeader } from "@/schedule/sheet-columns";
import { ApiError } from "@/components/schedule/api-client";
import type { Row } from "@/components/schedule/schedule-cache";
import { useProject } from "@/components/schedule/schedule-context";
import { useScheduleWrites, type BulkOp } from "@/components/schedule/use-schedule-writes";
import { editCell } from "./cell-edits";
import { cellKey } from "./grid-context";
import { planPaste } from "./paste-block";
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

/** Messages of a refused write, by row and column where the server named them. */
function explain(sheet: TSheet, error: unknown, rows: Row[]): string[] {
  if (!(error instanceof ApiError)) return [];
  return error.details.map((d) => {
    const col = SHEET_COLUMNS[sheet].find((c) => c.field === d.field);
    const row = rows.find((r) => r.id === d.id);
    return `${row ? String(row.label) : d.row ? `Change ${d.row}` : ""}${col ? ` · ${col.title}` : ""}: ${d.message}`;
  });
}

/** Typing, pasting, adding, duplicating and deleting rows of one sheet, with cell-level errors. */
export function useSheetEditing(sheet: TSheet, schedule: TSchedule) {
  const { system, notify } = useProject();
  const { bulk } = useScheduleWrites();
  const [cellErrors, setCellErrors] = useState(() => new Map<string, string>());
  const rows = (sheet === "surfaces" ? schedule.surfaces : schedule.duct_runs) as unknown as Row[];

  const setError = (key: string, message: string | null) =>
    setCellErrors((m) => {
      if (message === null && !m.has(key)) return m;
      const next = new Map(m);
      if (message === null) next.delete(key);
      else next.set(key, message);
      return next;
    });

  const send = useCallback(
    (ops: BulkOp[], done: string | null) =>
      bulk.mutate(ops, {
        onSuccess: () => done && notify({ tone: "ok", message: done }),
        onError: (error) => {
          const conflict = error instanceof ApiError && error.status === 409;
          notify({ tone: "error", message: conflict ? `${error.message}. The grid now shows the current values.` : error.message, lines: explain(sheet, error, rows) });
        },
      }),
    [bulk, notify, sheet, rows],
  );

  const onEdit = (row: Row, field: string, shown: unknown) => {
    const col = SHEET_COLUMNS[sheet].find((c) => c.field === field);
    if (!col) return;
    const out = editCell(sheet, row, col, shown, system);
    const key = cellKey(row.id, field);
    if (!out.ok) {
      setError(key, out.message);
      notify({ tone: "error", message: `Not saved — ${String(row.label)} · ${columnHeader(col, system)}: ${out.message}` });
      return;
    }
    setError(key, null);
    send([{ op: "update", sheet, id: row.id, values: out.values }], null);
  };

  const onPaste = (p: PasteRequest) => {
    const plan = planPaste({ ...p, sheet, system, lookups: { zones: schedule.zones, buildups: schedule.buildups }, newId });
    if (plan.problems.length) {
      notify({ tone: "error", message: `Nothing pasted: ${plan.problems.length} ${plan.problems.length === 1 ? "cell needs" : "cells need"} fixing`, lines: plan.problems.map((x) => `Line ${x.line}${x.row ? ` (${x.row})` : ""} · ${x.column}: ${x.message}`) });
      return;
    }
    const cells = p.text.trim().split(/\r?\n/).length;
    send(plan.ops, `Pasted ${cells} ${cells === 1 ? "line" : "lines"} into ${SHEET_TITLES[sheet]}`);
  };

  const addRow = () => {
    const last = rows[rows.length - 1];
    const row = last ? { ...last, id: newId(), version: 0, position: Number.MAX_SAFE_INTEGER, label: `${String(last.label)} (new)` } : blankRow(sheet, schedule);
    if (!row) return notify({ tone: "error", message: "Add a zone (and for surfaces a build-up) first: every row belongs to one" });
    send([{ op: "create", sheet, row }], null);
  };

  const duplicate = (ids: string[]) =>
    send(
      rows.filter((r) => ids.includes(r.id)).map((r, i) => ({ op: "create" as const, sheet, row: { ...r, id: newId(), version: 0, position: Number.MAX_SAFE_INTEGER - ids.length + i, label: `${String(r.label)} (copy)` } })),
      `Duplicated ${ids.length} ${ids.length === 1 ? "row" : "rows"}`,
    );

  const remove = (ids: string[]) => send(ids.map((id) => ({ op: "delete" as const, sheet, id })), `Deleted ${ids.length} ${ids.length === 1 ? "row" : "rows"}`);

  return { cellErrors, onEdit, onPaste, addRow, duplicate, remove, pending: bulk.isPending };
}

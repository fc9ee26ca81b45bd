import "server-only";
import { ductRunRowWorking, surfaceRowWorking, type Working } from "@/calc/index";
import { snapshotSchedule } from "@/checking/build-snapshot";
import { inputChanges, rowInputs, type InputSources } from "@/checking/accepted-inputs";
import type { TCheckSheet, TCheckState } from "@/checking/check-machine";
import { describeInputChanges, type ShownChange } from "@/checking/describe-input-changes";
import type { TProject } from "@/schemas/project";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { loadSchedule } from "@/server/repositories/schedule";
import { SHEET_NOUN, findCheck, userNames } from "@/server/repositories/row-checks";
import type { RowComment } from "./comment-on-row";
import { listRowComments } from "./list-row-comments";

export interface RowWorking {
  project: TProject;
  sheet: TCheckSheet;
  row: { id: string; label: string; version: number; zone: string; buildup: string | null };
  design_cases: { id: string; name: string; kind: string }[];
  /** The design case shown; null when the project has none yet. */
  design_case_id: string | null;
  working: Working | null;
  check: {
    state: TCheckState;
    checked_by_name: string | null;
    checked_at: string | null;
    checked_row_version: number | null;
    /** The current acceptance was one of several from the check view's list. */
    accepted_in_bulk: boolean;
    last_edited_by: number | null;
    last_edited_by_name: string | null;
  };
  /**
   * For a row accepted once and sent back since (unchecked, or queried after): who accepted it,
   * when, and what it depends on that changed since, in words. Null otherwise.
   */
  since_accepted: {
    accepted_by_name: string | null;
    accepted_at: string | null;
    in_bulk: boolean;
    row_version: number | null;
    changes: ShownChange[];
  } | null;
  comments: RowComment[];
  /** The next unchecked row after this one in schedule order (wrapping round), for "next unchecked". */
  next_unchecked: { sheet: TCheckSheet; id: string } | null;
}

/**
 * One row's working for one design case, exactly as the engine derives it (src/calc working()),
 * with the row's check state and thread: what the checker reads before accepting or querying.
 */
export async function getRowWorking(actor: Actor, projectId: string, sheet: TCheckSheet, rowId: string, caseId?: string): Promise<RowWorking> {
  const q = db();
  const schedule = await loadSchedule(q, actor.firm.id, projectId);
  if (!schedule) throw new AppError("not_found", "No project with that id in this firm");
  const rows = sheet === "surfaces" ? schedule.surfaces : schedule.duct_runs;
  const row = rows.find((r) => r.id === rowId);
  if (!row) throw new AppError("not_found", `No ${SHEET_NOUN[sheet]} with that id in this project`);
  const dc = caseId === undefined ? schedule.design_cases[0] : schedule.design_cases.find((d) => d.id === caseId);
  if (caseId !== undefined && !dc) throw new AppError("not_found", "No design case with that id in this project");

  const site = snapshotSchedule({ ...schedule, project: schedule.project }).site;
  const zone = schedule.zones.find((z) => z.id === row.zone_id)!;
  const buildup = "buildup_id" in row ? schedule.buildups.find((b) => b.id === row.buildup_id)! : null;
  let w: Working | null = null;
  // The schedule's row working: a surface's also carries the spread over the three methods and the inside-surface check (zone RH).
  if (dc) w = sheet === "surfaces" ? surfaceRowWorking(site, dc, zone, buildup!, row as (typeof schedule.surfaces)[number]) : ductRunRowWorking(site, dc, zone, row as (typeof schedule.duct_runs)[number]);

  const [check, comments, states] = await Promise.all([
    findCheck(q, projectId, sheet, rowId),
    listRowComments(actor, projectId, sheet, rowId),
    q("row_checks").where({ firm_id: actor.firm.id, project_id: projectId }).select("sheet", "row_id", "state"),
  ]);
  const names = await userNames(q, [check?.checked_by ?? null, check?.last_edited_by ?? null, check?.accepted_by ?? null]);
  const name = (id: number | null | undefined) => (id == null ? null : (names.get(id) ?? null));

  // Schedule order: surfaces then duct runs; look after this row first, then wrap round.
  const stateOf = new Map(states.map((s) => [`${s.sheet} ${s.row_id}`, s.state as TCheckState]));
  const order = [...schedule.surfaces.map((r) => ({ sheet: "surfaces" as const, id: r.id })), ...schedule.duct_runs.map((r) => ({ sheet: "duct_runs" as const, id: r.id }))];
  const here = order.findIndex((r) => r.sheet === sheet && r.id === rowId);
  const after = [...order.slice(here + 1), ...order.slice(0, here)];
  const next = after.find((r) => (stateOf.get(`${r.sheet} ${r.id}`) ?? "unchecked") === "unchecked") ?? null;

  return {
    project: schedule.project,
    sheet,
    row: { id: row.id, label: row.label, version: row.version, zone: zone.name, buildup: buildup?.name ?? null },
    design_cases: schedule.design_cases.map((d) => ({ id: d.id, name: d.name, kind: d.kind })),
    design_case_id: dc?.id ?? null,
    working: w,
    check: {
      state: check?.state ?? "unchecked",
      checked_by_name: name(check?.checked_by),
      checked_at: check?.checked_at ? new Date(check.checked_at).toISOString() : null,
      checked_row_version: check?.checked_row_version ?? null,
      accepted_in_bulk: check?.state === "accepted" && check.accepted_in_bulk,
      last_edited_by: check?.last_edited_by ?? null,
      last_edited_by_name: name(check?.last_edited_by),
    },
    since_accepted:
      check?.accepted_inputs && check.state !== "accepted"
        ? {
            accepted_by_name: name(check.accepted_by),
            accepted_at: check.accepted_at ? new Date(check.accepted_at).toISOString() : null,
            in_bulk: check.accepted_in_bulk,
            row_version: check.accepted_row_version,
            changes: describeInputChanges(
              inputChanges(check.accepted_inputs, rowInputs(sheet, row as unknown as Record<string, unknown>, { project: schedule.project, zones: schedule.zones, buildups: schedule.buildups, design_cases: schedule.design_cases } as unknown as InputSources)),
              { sheet, system: schedule.project.unit_system, zones: new Map(schedule.zones.map((z) => [z.id, z.name])), buildups: new Map(schedule.buildups.map((b) => [b.id, b.name])) },
            ),
          }
        : null,
    comments,
    next_unchecked: next,
  };
}

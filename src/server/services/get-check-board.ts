import "server-only";
import type { TCheckSheet, TCheckState } from "@/checking/check-machine";
import { rowProblem } from "@/schedule/result-columns";
import { revisionLetter } from "@/checking/revision-letter";
import type { TProject } from "@/schemas/project";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import type { TBoardFilter } from "@/schemas/checking";
import type { TSchedule } from "@/schemas/schedule";
import { resultsFor } from "@/schedule/engine-schedule";
import { plainText } from "@/report/plain-words";
import { loadSchedule } from "@/server/repositories/schedule";
import { userNames, type CheckCounts } from "@/server/repositories/row-checks";
import { getProjectOrThrow } from "./get-project";

export interface BoardRow {
  sheet: TCheckSheet;
  id: string;
  label: string;
  zone: string;
  version: number;
  state: TCheckState;
  checked_by_name: string | null;
  checked_at: string | null;
  last_edited_by: number | null;
  last_edited_by_name: string | null;
  comments: number;
  /** The current acceptance was one of several from the check list. */
  accepted_in_bulk: boolean;
  /** Accepted once and sent back by a change since (now unchecked or queried). */
  changed_since_accepted: boolean;
  /** Warnings and errors of the row over every design case, in words (distinct, "Case: message"). */
  warnings: string[];
}

export interface CheckBoard {
  project: TProject;
  counts: CheckCounts & { warnings: number; changed: number };
  /** Every row in schedule order (surfaces, then duct runs), filtered when asked. */
  rows: BoardRow[];
  /** The first unchecked row in schedule order, whatever the filter. */
  next_unchecked: { sheet: TCheckSheet; id: string } | null;
  latest_revision: string | null;
  next_revision: string;
}

/** The check view of a project: every row with its state, the counts, and what comes next. */
export async function getCheckBoard(actor: Actor, projectId: string, filter: TBoardFilter = {}): Promise<CheckBoard> {
  const project = await getProjectOrThrow(actor, projectId);
  const q = db();
  const sheetRows = (sheet: TCheckSheet) =>
    q(`${sheet} as r`)
      .join("zones as z", "z.id", "r.zone_id")
      .leftJoin("row_checks as c", (j) => j.on("c.project_id", "r.project_id").andOn("c.row_id", "r.id").andOnVal("c.sheet", sheet))
      .where({ "r.firm_id": actor.firm.id, "r.project_id": projectId })
      .orderBy([{ column: "r.position" }, { column: "r.created_at" }])
      .select(
        "r.id", "r.label", "r.version", "z.name as zone",
        q.raw("coalesce(c.state, 'unchecked') as state"), "c.checked_by", "c.checked_at", "c.last_edited_by",
        q.raw("coalesce(c.accepted_in_bulk, false) as accepted_in_bulk"), q.raw("(c.accepted_at is not null) as once_accepted"),
        q.raw("(select count(*) from row_comments m where m.project_id = r.project_id and m.sheet = ? and m.row_id = r.id) as comments", [sheet]),
      );
  const [surfaces, ducts, latest, schedule] = await Promise.all([
    sheetRows("surfaces"),
    sheetRows("duct_runs"),
    q("revisions").where({ firm_id: actor.firm.id, project_id: projectId }).orderBy("sequence", "desc").first("sequence", "letter"),
    loadSchedule(q, actor.firm.id, projectId),
  ]);
  const warned = schedule ? rowWarnings(schedule) : new Map<string, string[]>();
  const raw = [...surfaces.map((r) => ({ ...r, sheet: "surfaces" as const })), ...ducts.map((r) => ({ ...r, sheet: "duct_runs" as const }))];
  const names = await userNames(q, raw.flatMap((r) => [r.checked_by, r.last_edited_by]));
  const all: BoardRow[] = raw.map((r) => ({
    sheet: r.sheet, id: r.id, label: r.label, zone: r.zone, version: r.version, state: r.state,
    checked_by_name: r.checked_by === null ? null : (names.get(r.checked_by) ?? null),
    checked_at: r.checked_at === null ? null : new Date(r.checked_at).toISOString(),
    last_edited_by: r.last_edited_by,
    last_edited_by_name: r.last_edited_by === null ? null : (names.get(r.last_edited_by) ?? null),
    comments: Number(r.comments),
    accepted_in_bulk: r.state === "accepted" && r.accepted_in_bulk === true,
    changed_since_accepted: r.state !== "accepted" && r.once_accepted === true,
    warnings: warned.get(`${r.sheet}:${r.id}`) ?? [],
  }));
  const counts: CheckBoard["counts"] = { rows: all.length, unchecked: 0, accepted: 0, queried: 0, warnings: 0, changed: 0 };
  for (const r of all) {
    counts[r.state]++;
    if (r.warnings.length > 0) counts.warnings++;
    if (r.changed_since_accepted) counts.changed++;
  }
  const next = all.find((r) => r.state === "unchecked");
  return {
    project,
    counts,
    rows: all.filter(
      (r) =>
        (filter.state === undefined || r.state === filter.state) &&
        (filter.sheet === undefined || r.sheet === filter.sheet) &&
        (!filter.warnings || r.warnings.length > 0) &&
        (!filter.changed || r.changed_since_accepted),
    ),
    next_unchecked: next ? { sheet: next.sheet, id: next.id } : null,
    latest_revision: latest?.letter ?? null,
    next_revision: revisionLetter((latest?.sequence ?? 0) + 1),
  };
}

/**
 * Each row's warnings and errors over every design case, as the schedule's notes show them
 * ("Winter: …"), distinct; rows with none are left out. The engine runs here, as in the grid.
 */
function rowWarnings(schedule: TSchedule): Map<string, string[]> {
  const out = new Map<string, string[]>();
  const add = (key: string, text: string) => {
    const list = out.get(key) ?? [];
    if (!list.includes(text)) list.push(text);
    out.set(key, list);
  };
  for (const dc of schedule.design_cases) {
    const res = resultsFor(schedule, dc);
    for (const sheet of ["surfaces", "duct_runs"] as const) {
      for (const r of res[sheet]) {
        const key = `${sheet}:${r.row_id}`;
        if (r.result.ok) for (const w of r.result.warnings) add(key, `${dc.name}: ${plainText(w.message)}`);
        else add(key, `${dc.name}: ${rowProblem(r)?.text ?? r.result.error.message}`);
      }
    }
  }
  return out;
}

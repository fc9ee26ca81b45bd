import "server-only";
import type { TCheckSheet, TCheckState } from "@/checking/check-machine";
import { revisionLetter } from "@/checking/revision-letter";
import type { TProject } from "@/schemas/project";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
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
}

export interface CheckBoard {
  project: TProject;
  counts: CheckCounts;
  /** Every row in schedule order (surfaces, then duct runs), filtered when asked. */
  rows: BoardRow[];
  /** The first unchecked row in schedule order, whatever the filter. */
  next_unchecked: { sheet: TCheckSheet; id: string } | null;
  latest_revision: string | null;
  next_revision: string;
}

/** The check view of a project: every row with its state, the counts, and what comes next. */
export async function getCheckBoard(actor: Actor, projectId: string, filter: { state?: TCheckState; sheet?: TCheckSheet } = {}): Promise<CheckBoard> {
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
        q.raw("(select count(*) from row_comments m where m.project_id = r.project_id and m.sheet = ? and m.row_id = r.id) as comments", [sheet]),
      );
  const [surfaces, ducts, latest] = await Promise.all([
    sheetRows("surfaces"),
    sheetRows("duct_runs"),
    q("revisions").where({ firm_id: actor.firm.id, project_id: projectId }).orderBy("sequence", "desc").first("sequence", "letter"),
  ]);
  const raw = [...surfaces.map((r) => ({ ...r, sheet: "surfaces" as const })), ...ducts.map((r) => ({ ...r, sheet: "duct_runs" as const }))];
  const names = await userNames(q, raw.flatMap((r) => [r.checked_by, r.last_edited_by]));
  const all: BoardRow[] = raw.map((r) => ({
    sheet: r.sheet, id: r.id, label: r.label, zone: r.zone, version: r.version, state: r.state,
    checked_by_name: r.checked_by === null ? null : (names.get(r.checked_by) ?? null),
    checked_at: r.checked_at === null ? null : new Date(r.checked_at).toISOString(),
    last_edited_by: r.last_edited_by,
    last_edited_by_name: r.last_edited_by === null ? null : (names.get(r.last_edited_by) ?? null),
    comments: Number(r.comments),
  }));
  const counts: CheckCounts = { rows: all.length, unchecked: 0, accepted: 0, queried: 0 };
  for (const r of all) counts[r.state]++;
  const next = all.find((r) => r.state === "unchecked");
  return {
    project,
    counts,
    rows: all.filter((r) => (filter.state === undefined || r.state === filter.state) && (filter.sheet === undefined || r.sheet === filter.sheet)),
    next_unchecked: next ? { sheet: next.sheet, id: next.id } : null,
    latest_revision: latest?.letter ?? null,
    next_revision: revisionLetter((latest?.sequence ?? 0) + 1),
  };
}

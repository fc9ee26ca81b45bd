import "server-only";
import type { Knex } from "knex";
import type { TSchedule } from "@/schemas/schedule";
import { PROJECT_COLUMNS } from "@/server/services/list-projects";
import { ENTITIES, readColumns, type EntityName } from "@/server/schedule/entities";

type Q = Knex | Knex.Transaction;

/** Rows of one table of a project, in the schedule's order; optionally only some ids, locked. */
export async function loadItems(q: Q, name: EntityName, firmId: string, projectId: string, opts: { ids?: string[]; lock?: boolean } = {}): Promise<Record<string, unknown>[]> {
  const e = ENTITIES[name];
  let query = q(e.table).where({ firm_id: firmId, project_id: projectId }).select(readColumns(e));
  if (opts.ids) query = query.whereIn("id", opts.ids);
  query = e.positioned ? query.orderBy([{ column: "position" }, { column: "created_at" }]) : query.orderBy([{ column: "name" }]);
  if (opts.lock) query = query.forUpdate();
  const rows = await query;
  return name === "buildups" ? attachLayers(q, rows) : rows;
}

/** Build-ups with their layers, in layer order. */
export async function attachLayers(q: Q, buildups: Record<string, unknown>[]): Promise<Record<string, unknown>[]> {
  if (buildups.length === 0) return buildups;
  const layers = await q("buildup_layers")
    .whereIn("buildup_id", buildups.map((b) => b.id as string))
    .orderBy(["buildup_id", "position"])
    .select("buildup_id", "material", "thickness_m", "k_W_mK");
  const by = new Map<string, { material: string; thickness_m: number; k_W_mK: number }[]>();
  for (const { buildup_id, ...layer } of layers) {
    const list = by.get(buildup_id) ?? [];
    list.push(layer);
    by.set(buildup_id, list);
  }
  return buildups.map((b) => ({ ...b, layers: by.get(b.id as string) ?? [] }));
}

/** The whole schedule of a project of this firm, or null when the firm has no such project. */
export async function loadSchedule(q: Q, firmId: string, projectId: string): Promise<TSchedule | null> {
  const project = await q("projects").where({ id: projectId, firm_id: firmId }).first([...PROJECT_COLUMNS]);
  if (!project) return null;
  const tables = ["design_cases", "zones", "buildups", "surfaces", "duct_runs"] as const;
  // On the pool the five reads run side by side; a transaction has one connection, so in turn.
  const [design_cases, zones, buildups, surfaces, duct_runs] = (q as Knex.Transaction).isTransaction
    ? await tables.reduce<Promise<Record<string, unknown>[][]>>(async (acc, n) => [...(await acc), await loadItems(q, n, firmId, projectId)], Promise.resolve([]))
    : await Promise.all(tables.map((n) => loadItems(q, n, firmId, projectId)));
  // The rows hold exactly the columns the schemas name (readColumns), as PostgreSQL typed them.
  return { project, design_cases, zones, buildups, surfaces, duct_runs } as unknown as TSchedule;
}

import "server-only";
import type { Knex } from "knex";
import { rowInputs, SITE_FIELDS, type AcceptedInputs, type InputSources } from "@/checking/accepted-inputs";
import type { TCheckSheet } from "@/checking/check-machine";
import { ENTITIES, readColumns } from "@/server/schedule/entities";
import { loadItems } from "./schedule";

type Q = Knex | Knex.Transaction;
type Item = Record<string, unknown>;

/** The columns of a sheet's rows that are inputs, as the schedule reads them (with id and version). */
export const rowInputColumns = (sheet: TCheckSheet) => readColumns(ENTITIES[sheet]);

/**
 * What the given rows' results depend on now — their zones, build-ups, every design case and the
 * site — read in a few statements whatever the number of rows (a bulk accept of a whole sheet).
 */
export async function inputSourcesFor(q: Q, firmId: string, projectId: string, rows: readonly Item[]): Promise<InputSources> {
  const zoneIds = [...new Set(rows.map((r) => r.zone_id as string))];
  const buildupIds = [...new Set(rows.map((r) => r.buildup_id as string | undefined).filter((id): id is string => typeof id === "string"))];
  const project = await q("projects").where({ id: projectId, firm_id: firmId }).first<Item>([...SITE_FIELDS]);
  const design_cases = await loadItems(q, "design_cases", firmId, projectId);
  const zones = zoneIds.length > 0 ? await loadItems(q, "zones", firmId, projectId, { ids: zoneIds }) : [];
  const buildups = buildupIds.length > 0 ? await loadItems(q, "buildups", firmId, projectId, { ids: buildupIds }) : [];
  return { project: project ?? {}, design_cases, zones, buildups };
}

/** Each row's inputs now, keyed "sheet:id", in the form kept at acceptance. */
export async function currentInputs(q: Q, firmId: string, projectId: string, rows: readonly { sheet: TCheckSheet; row: Item }[]): Promise<Map<string, AcceptedInputs>> {
  const from = await inputSourcesFor(q, firmId, projectId, rows.map((r) => r.row));
  return new Map(rows.map((r) => [`${r.sheet}:${String(r.row.id)}`, rowInputs(r.sheet, r.row, from)]));
}

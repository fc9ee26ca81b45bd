// Many rows in one change are written set-based: a bulk update of 600 rows, a checker accepting
// them all and a replace of a 600-row sheet take a handful of statements, not one (or more) per row — counted on the real
// PostgreSQL through Knex's query events — and the rows hold exactly what was sent.
import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { writeItems } from "@/server/schedule/write-items";
import { acceptRows } from "@/server/services/accept-rows";
import { grantPaidPlan } from "../support/billing";
import { closeTestDb, testDb } from "../support/db";
import { makeProject, SURFACE_VALUES, type FixtureProject } from "../support/schedule-fixtures";

const N = 600;
let fx: FixtureProject;
let actor: Actor;
let ids: string[];

beforeAll(async () => {
  fx = await makeProject("tarnbrook-sill");
  await grantPaidPlan(fx.firmId);
  const firm = await testDb()("firms").where({ id: fx.firmId }).first("id", "name");
  actor = { via: "token", userId: null, name: "batch test", email: null, firm, roles: ["consultant"], firms: [firm], tokenId: null };
  ids = Array.from({ length: N }, () => randomUUID());
  const rows = ids.map((id, i) => ({ ...SURFACE_VALUES, id, firm_id: fx.firmId, project_id: fx.projectId, position: 10 + i, label: `Batch ${i}`, zone_id: fx.zoneIds[0], buildup_id: fx.buildupIds.layered }));
  for (let i = 0; i < rows.length; i += 300) await testDb()("surfaces").insert(rows.slice(i, i + 300));
});
afterAll(async () => {
  await testDb()("projects").where({ id: fx.projectId }).delete();
  await db().destroy();
  await closeTestDb();
});

/** Runs `work` and counts the SQL statements it sends through the app's pool. */
async function counting<T>(work: () => Promise<T>): Promise<{ result: T; statements: number }> {
  let statements = 0;
  const listen = () => statements++;
  db().on("query", listen);
  try {
    return { result: await work(), statements };
  } finally {
    db().off("query", listen);
  }
}

describe("set-based writes", () => {
  test(`a bulk update of ${N} rows takes a few statements and saves every value`, async () => {
    const changes = ids.map((id, i) => ({ op: "update" as const, entity: "surfaces" as const, id, version: 1, values: { area_m2: 100 + i }, row: i + 1 }));
    const { result, statements } = await counting(() => db().transaction((trx) => writeItems(trx, actor, fx.projectId, changes)));
    expect(result.updated).toHaveLength(N);
    expect(statements).toBeLessThan(40);
    const stored = await testDb()("surfaces").whereIn("id", ids).select("id", "area_m2", "version");
    const byId = new Map(stored.map((r) => [r.id, r]));
    ids.forEach((id, i) => expect([byId.get(id).area_m2, byId.get(id).version]).toEqual([100 + i, 2]));
  });

  test("a stale version among them refuses the whole bulk update (409), nothing saved", async () => {
    const changes = ids.slice(0, 50).map((id, i) => ({ op: "update" as const, entity: "surfaces" as const, id, version: i === 37 ? 1 : 2, values: { area_m2: 1 }, row: i + 1 }));
    const error = await db().transaction((trx) => writeItems(trx, actor, fx.projectId, changes)).catch((e: unknown) => e);
    expect(error).toMatchObject({ code: "conflict" });
    expect(await testDb()("surfaces").whereIn("id", ids.slice(0, 50)).where({ area_m2: 1 }).count({ n: "*" })).toEqual([{ n: "0" }]);
  });

  test(`a checker accepting ${N} rows takes a few statements, and each is accepted at its version`, async () => {
    const checker = await testDb()("users").where({ email: "checker@demo.filmsheet.test" }).first("id", "name", "email");
    const as: Actor = { ...actor, via: "session", userId: checker.id, name: checker.name, email: checker.email, roles: ["checker"] };
    const rows = ids.map((id) => ({ sheet: "surfaces" as const, id, row_version: 2 }));
    const { result, statements } = await counting(() => acceptRows(as, fx.projectId, { rows, filter: "Unchecked", confirmed_count: N }));
    expect(result).toEqual({ accepted: N });
    expect(statements).toBeLessThan(20);
    const checks = await testDb()("row_checks").where({ project_id: fx.projectId, sheet: "surfaces" }).whereIn("row_id", ids).select("state", "checked_by", "checked_row_version");
    expect(checks).toHaveLength(N);
    expect(checks.every((c) => c.state === "accepted" && c.checked_by === checker.id && c.checked_row_version === 2)).toBe(true);
    // Accepting them again is refused, all of them named, none changed.
    const again = await acceptRows(as, fx.projectId, { rows: rows.slice(0, 3), filter: "Unchecked", confirmed_count: 3 }).catch((e: unknown) => e);
    expect(again).toMatchObject({ code: "conflict" });
    expect((again as { details: unknown[] }).details).toHaveLength(3);
  });

  test(`deleting ${N} rows (what a replace-import does first) takes a few statements`, async () => {
    const changes = ids.map((id, i) => ({ op: "delete" as const, entity: "surfaces" as const, id, version: 2, row: i + 1 }));
    const { statements } = await counting(() => db().transaction((trx) => writeItems(trx, actor, fx.projectId, changes)));
    expect(statements).toBeLessThan(40);
    expect(await testDb()("surfaces").whereIn("id", ids).count({ n: "*" })).toEqual([{ n: "0" }]);
  });
});

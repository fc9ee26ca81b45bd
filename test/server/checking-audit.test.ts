// The audit trail on the real PostgreSQL: every kind of change to a project's data leaves its
// rows (who, what, before and after) in the same transaction, and a failed change leaves none.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startAppWithSessions, type BuiltApp } from "../support/app-with-sessions";
import { auditOf } from "../support/checking";
import { closeTestDb, testDb } from "../support/db";
import { DUCT_VALUES, makeProject, SURFACE_VALUES, type FixtureProject } from "../support/schedule-fixtures";

let app: BuiltApp;
let as: Record<"consultant@demo.filmsheet.test" | "checker@demo.filmsheet.test", Record<string, string>>;

beforeAll(async () => {
  ({ app, as } = await startAppWithSessions(["consultant@demo.filmsheet.test", "checker@demo.filmsheet.test"] as const));
});

afterAll(async () => {
  await app?.close();
  await closeTestDb();
});

const send = (method: "post" | "patch" | "delete", path: string, body?: object, who = as["consultant@demo.filmsheet.test"]) => {
  const req = request(app.server)[method](path).set(who);
  return body === undefined ? req : req.send(body);
};

// [change, request, the audit rows it must leave: entity, action, and a field of before/after]
const has = (o: object) => expect.objectContaining(o);
const CHANGES: [string, (fx: FixtureProject) => Promise<[string, string, object | undefined]>, { entity: string; action: string; before?: unknown; after?: unknown }[]][] = [
  ["a surface edited", async (fx) => ["patch", `/api/projects/${fx.projectId}/surfaces/${fx.surfaceIds[0]}`, { version: 1, tilt_deg: 85 }], [{ entity: "surfaces", action: "update", before: has({ tilt_deg: 90, version: 1 }), after: has({ tilt_deg: 85, version: 2 }) }]],
  ["a duct run added", async (fx) => ["post", `/api/projects/${fx.projectId}/duct-runs`, { ...DUCT_VALUES, label: "Kitchen extract", zone_id: fx.zoneIds[0] }], [{ entity: "duct_runs", action: "create", before: null, after: has({ label: "Kitchen extract", version: 1 }) }]],
  ["a duct run deleted", async (fx) => ["delete", `/api/projects/${fx.projectId}/duct-runs/${fx.ductRunIds[0]}?version=1`, undefined], [{ entity: "duct_runs", action: "delete", before: has({ label: "Roof supply" }), after: null }]],
  ["a build-up's layers changed", async (fx) => ["patch", `/api/projects/${fx.projectId}/buildups/${fx.buildupIds.layered}`, { version: 1, layers: [{ material: "Brick", thickness_m: 0.1, k_W_mK: 0.77 }] }], [{ entity: "buildups", action: "update", before: has({ layers: [has({ material: "Brick" }), has({ material: "Mineral wool" })] }), after: has({ layers: [has({ material: "Brick" })] }) }]],
  ["a zone renamed", async (fx) => ["patch", `/api/projects/${fx.projectId}/zones/${fx.zoneIds[1]}`, { version: 1, name: "Back office" }], [{ entity: "zones", action: "update", before: has({ name: "Office" }), after: has({ name: "Back office" }) }]],
  ["a design case added", async (fx) => ["post", `/api/projects/${fx.projectId}/design-cases`, { name: "Still night", kind: "heating", T_outdoor_C: -8, RH_outdoor_pct: 95, V_met_m_s: 0, wind_from_deg: 0, solar_W_m2: {} }], [{ entity: "design_cases", action: "create", before: null, after: has({ name: "Still night" }) }]],
  ["the site changed", async (fx) => ["patch", `/api/projects/${fx.projectId}`, { version: 1, terrain: "open" }], [{ entity: "project", action: "update", before: has({ terrain: "suburban" }), after: has({ terrain: "open" }) }]],
  [
    "two rows in one bulk change",
    async (fx) => ["post", `/api/projects/${fx.projectId}/bulk`, { changes: [{ op: "update", sheet: "surfaces", id: fx.surfaceIds[1], version: 1, values: { area_m2: 7 } }, { op: "create", sheet: "surfaces", values: { ...SURFACE_VALUES, label: "Gable", zone_id: fx.zoneIds[0], buildup_id: fx.buildupIds.direct } }] }],
    [{ entity: "surfaces", action: "create", before: null, after: has({ label: "Gable" }) }, { entity: "surfaces", action: "update", before: has({ area_m2: 12.5 }), after: has({ area_m2: 7 }) }],
  ],
];

describe("every change records who, what, before and after", () => {
  test.each(CHANGES)("%s", async (_what, req, expected) => {
    const fx = await makeProject("tarnbrook-sill");
    const [method, path, body] = await req(fx);
    const res = await send(method as "post", path, body);
    expect(res.status, res.text).toBeLessThan(300);
    // Check resets are recorded too; here only the changes themselves.
    const rows = (await auditOf(fx.projectId)).filter((r) => r.entity !== "row_check");
    expect(rows).toHaveLength(expected.length);
    for (const e of expected) {
      expect(rows).toContainEqual(expect.objectContaining({ ...e, actor_name: "Idris Okonkwo-Hale" }));
    }
  });

  test("a query, an answer and a check request are recorded with their words", async () => {
    const fx = await makeProject("tarnbrook-sill");
    const row = `/api/projects/${fx.projectId}/duct-runs/${fx.ductRunIds[0]}`;
    expect((await send("post", `${row}/check`, { move: "query", row_version: 1, comment: "Jacket emissivity 0.1 — is it bare aluminium?" }, as["checker@demo.filmsheet.test"])).status).toBe(200);
    expect((await send("post", `${row}/comments`, { body: "Yes: aluminium-faced, per the duct spec" })).status).toBe(201);
    expect((await send("post", `/api/projects/${fx.projectId}/check-requests`, { message: "Ready for you" })).status).toBe(201);
    expect(await auditOf(fx.projectId)).toEqual([
      expect.objectContaining({ entity: "row_check", action: "query", actor_name: "Solveig Prynne", after: expect.objectContaining({ state: "queried", comment: "Jacket emissivity 0.1 — is it bare aluminium?" }) }),
      expect.objectContaining({ entity: "row_comment", action: "answer", actor_name: "Idris Okonkwo-Hale", after: expect.objectContaining({ body: "Yes: aluminium-faced, per the duct spec" }) }),
      expect.objectContaining({ entity: "project", action: "request_check", after: expect.objectContaining({ message: "Ready for you", rows: 5, queried: 1, unchecked: 4 }) }),
    ]);
    const history = await send("post", `${row}/history`);
    expect(history.status).toBe(405);
    const rowHistory = await request(app.server).get(`${row}/history`).set(as["checker@demo.filmsheet.test"]);
    expect(rowHistory.status).toBe(200);
    expect(rowHistory.body.entries.map((e: { action: string }) => e.action)).toEqual(["answer", "query"]);
  });
});

describe("a failed change leaves no audit rows", () => {
  test("a bulk change with one bad row saves nothing and records nothing", async () => {
    const fx = await makeProject("tarnbrook-sill");
    const res = await send("post", `/api/projects/${fx.projectId}/bulk`, {
      changes: [
        { op: "update", sheet: "surfaces", id: fx.surfaceIds[0], version: 1, values: { area_m2: 9 } },
        { op: "update", sheet: "surfaces", id: fx.surfaceIds[1], version: 1, values: { area_m2: -4 } },
      ],
    });
    expect(res.status).toBe(422);
    expect(await auditOf(fx.projectId)).toEqual([]);
  });

  test("a stale edit records nothing", async () => {
    const fx = await makeProject("tarnbrook-sill");
    expect((await send("patch", `/api/projects/${fx.projectId}/surfaces/${fx.surfaceIds[0]}`, { version: 7, area_m2: 9 })).status).toBe(409);
    expect(await auditOf(fx.projectId)).toEqual([]);
  });
});

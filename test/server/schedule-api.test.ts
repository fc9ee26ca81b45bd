// The schedule API on the built app and the real PostgreSQL: create, read, update and delete of
// every item table; 409 with the current row on a stale version; bulk changes all or nothing;
// other firms' ids not found.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startAppWithSessions, type BuiltApp } from "../support/app-with-sessions";
import { closeTestDb, testDb } from "../support/db";
import { makeProject, snapshot, SURFACE_VALUES, DUCT_VALUES, type FixtureProject } from "../support/schedule-fixtures";
import { bearer, makeToken } from "../support/tokens";
import { clearPlan } from "../support/billing";

let app: BuiltApp;
let consultant: Record<string, string>;
let admin: Record<string, string>;
let otherFirm: Record<string, string>;
let otherConsultantToken: Record<string, string>;
let fx: FixtureProject;

type Method = "get" | "post" | "patch" | "delete";
const call = (who: Record<string, string>, method: Method, path: string, body?: object) => {
  const req = request(app.server)[method](path).set(who);
  return body === undefined ? req : req.send(body);
};
const as = (method: Method, path: string, body?: object) => call(consultant, method, path, body);

beforeAll(async () => {
  const started = await startAppWithSessions(["consultant@demo.filmsheet.test", "admin@demo.filmsheet.test", "admin@other.filmsheet.test"]);
  app = started.app;
  consultant = started.as["consultant@demo.filmsheet.test"];
  admin = started.as["admin@demo.filmsheet.test"];
  otherFirm = started.as["admin@other.filmsheet.test"];
  otherConsultantToken = bearer(await makeToken("ostrander-mechanical", "consultant"));
  fx = await makeProject("tarnbrook-sill");
});

afterAll(async () => {
  await app?.close();
  await closeTestDb();
});

// [path, values to create, one change, the field it changes]
const ENTITIES: [string, () => Record<string, unknown>, Record<string, unknown>][] = [
  ["design-cases", () => ({ name: "Autumn check", kind: "heating", T_outdoor_C: 2, RH_outdoor_pct: 80, V_met_m_s: 6, wind_from_deg: 270, solar_W_m2: { S: 120 } }), { T_outdoor_C: -1.5 }],
  ["zones", () => ({ name: "Store", floor_area_m2: 22, T_heating_C: 16, T_cooling_C: 26, RH_inside_pct: 45 }), { floor_area_m2: 24 }],
  ["buildups", () => ({ name: "Timber wall", layers: [{ material: "Timber", thickness_m: 0.1, k_W_mK: 0.13 }], R_direct_m2K_W: null, absorptance: 0.5, emissivity: 0.9 }), { absorptance: 0.35 }],
  ["surfaces", () => ({ ...SURFACE_VALUES, label: "North wall", azimuth_deg: 0, zone_id: fx.zoneIds[1], buildup_id: fx.buildupIds.layered }), { area_m2: 9.75 }],
  ["duct-runs", () => ({ ...DUCT_VALUES, label: "Void supply", zone_id: fx.zoneIds[1] }), { flow_m3_s: 0.65 }],
];

describe("create, read, update and delete of every item table", () => {
  test.each(ENTITIES)("%s", async (path, values, change) => {
    const base = `/api/projects/${fx.projectId}/${path}`;
    const created = await as("post", base, values());
    expect(created.status, created.text).toBe(201);
    expect(created.body).toMatchObject({ ...values(), version: 1 });
    const id = created.body.id as string;

    expect((await as("get", `${base}/${id}`)).body).toEqual(created.body);
    expect((await as("get", base)).body.items.map((i: { id: string }) => i.id)).toContain(id);

    const updated = await as("patch", `${base}/${id}`, { version: 1, ...change });
    expect(updated.status, updated.text).toBe(200);
    expect(updated.body).toMatchObject({ ...change, version: 2 });

    // A write based on version 1 after it became 2: refused, with the row as it stands.
    const stale = await as("patch", `${base}/${id}`, { version: 1, ...change });
    expect(stale.status).toBe(409);
    expect(stale.body.error.details[0]).toMatchObject({ id, field: "version", current: updated.body });
    const staleDelete = await as("delete", `${base}/${id}?version=1`);
    expect(staleDelete.status).toBe(409);

    expect((await as("delete", `${base}/${id}?version=2`)).status).toBe(200);
    expect((await as("get", `${base}/${id}`)).status).toBe(404);
  });
});

describe("bad input names the field and saves nothing", () => {
  test("a surface with a negative area and an unknown field", async () => {
    const before = await snapshot(fx.projectId);
    const res = await as("post", `/api/projects/${fx.projectId}/surfaces`, { ...SURFACE_VALUES, area_m2: -2, zone_id: fx.zoneIds[0], buildup_id: fx.buildupIds.layered, colour: "red" });
    expect(res.status).toBe(422);
    expect(res.body.error.details).toEqual(
      expect.arrayContaining([
        { row: 1, sheet: "surfaces", field: "area_m2", message: "Area must be greater than 0 m² and at most 100000 m²" },
        { row: 1, sheet: "surfaces", field: "colour", message: "colour is not a field of a surface" },
      ]),
    );
    expect(await snapshot(fx.projectId)).toEqual(before);
  });

  test("a rectangular duct without its width, and a zone of another project", async () => {
    const other = await makeProject("tarnbrook-sill");
    const res = await as("patch", `/api/projects/${fx.projectId}/duct-runs/${fx.ductRunIds[0]}`, { version: 1, shape: "rect", height_m: 0.3, zone_id: other.zoneIds[0] });
    expect(res.status).toBe(422);
    const fields = res.body.error.details.map((d: { field: string; message: string }) => `${d.field}: ${d.message}`);
    expect(fields).toEqual(expect.arrayContaining(["width_m: Width is required for a rectangular duct", `zone_id: Zone ${other.zoneIds[0]} is not in this project`]));
  });

  test("a zone still used by rows cannot be deleted", async () => {
    const res = await as("delete", `/api/projects/${fx.projectId}/zones/${fx.zoneIds[0]}?version=1`);
    expect(res.status).toBe(409);
    expect(res.body.error.details[0].message).toMatch(/^Hall is used by 2 surfaces; move or delete them first$/);
  });
});

describe("a duct run's cooling surround", () => {
  // Fixture "Void extract": 13 °C cooling supply through an 18 °C void (schedule-fixtures.ts).
  // Direction only, from the sign convention (Q_W = heat gained by the air): a warmer void in the
  // cooling case gains more heat into the cold air; the heating case does not read the field.
  test("is saved through PATCH, read back, and moves the cooling results only; a bad value is refused naming it", async () => {
    const p = await makeProject("tarnbrook-sill");
    const id = p.ductRunIds[1]!;
    const item = `/api/projects/${p.projectId}/duct-runs/${id}`;
    const flow = async (caseId: string) => {
      const res = await as("get", `/api/projects/${p.projectId}/results?case=${caseId}`);
      expect(res.status, res.text).toBe(200);
      const r = res.body.duct_runs.find((d: { row_id: string }) => d.row_id === id).result;
      expect(r.ok, JSON.stringify(r)).toBe(true);
      return r.Q_W as number;
    };
    expect((await as("get", item)).body).toMatchObject({ T_surround_C: 18, T_surround_cooling_C: null });
    const before = { cooling: await flow(p.caseIds.cooling), heating: await flow(p.caseIds.heating) };
    expect(before.cooling).toBeGreaterThan(0);

    const patched = await as("patch", item, { version: 1, T_surround_cooling_C: 29 });
    expect(patched.status, patched.text).toBe(200);
    expect(patched.body).toMatchObject({ T_surround_C: 18, T_surround_cooling_C: 29, version: 2 });
    expect((await as("get", item)).body).toEqual(patched.body);
    expect(await testDb()("duct_runs").where({ id }).first("T_surround_cooling_C")).toEqual({ T_surround_cooling_C: 29 });
    expect(await flow(p.caseIds.cooling)).toBeGreaterThan(before.cooling);
    expect(await flow(p.caseIds.heating)).toBe(before.heating);

    const stored = await snapshot(p.projectId);
    for (const bad of ["warm", 160]) {
      const res = await as("patch", item, { version: 2, T_surround_cooling_C: bad });
      expect(res.status).toBe(422);
      expect(res.body.error.details).toEqual([
        expect.objectContaining({ field: "T_surround_cooling_C", message: bad === "warm" ? "Surrounding air, cooling must be a number" : "Surrounding air, cooling must be between -50 °C and 150 °C" }),
      ]);
    }
    expect(await snapshot(p.projectId)).toEqual(stored);

    // Blank again: cooling is as heating once more, so the results are those of the start.
    const cleared = await as("patch", item, { version: 2, T_surround_cooling_C: null });
    expect(cleared.status, cleared.text).toBe(200);
    expect(await flow(p.caseIds.cooling)).toBe(before.cooling);
  });
});

describe("bulk changes", () => {
  const surface = (i: number) => fx.surfaceIds[i]!;

  test("one invalid row among valid ones changes nothing, and the error names row and field", async () => {
    const before = await snapshot(fx.projectId);
    const res = await as("post", `/api/projects/${fx.projectId}/bulk`, {
      changes: [
        { op: "update", sheet: "surfaces", id: surface(0), version: 1, values: { area_m2: 20 } },
        { op: "create", sheet: "surfaces", values: { ...SURFACE_VALUES, zone_id: fx.zoneIds[0], buildup_id: fx.buildupIds.layered } },
        { op: "update", sheet: "surfaces", id: surface(1), version: 1, values: { tilt_deg: 200 } },
        { op: "delete", sheet: "duct_runs", id: fx.ductRunIds[1], version: 1 },
      ],
    });
    expect(res.status).toBe(422);
    expect(res.body.error.message).toBe("1 problem in 1 row; nothing was saved");
    expect(res.body.error.details).toEqual([{ row: 3, sheet: "surfaces", id: surface(1), field: "tilt_deg", message: "Tilt must be between 0° and 180°" }]);
    expect(await snapshot(fx.projectId)).toEqual(before);
  });

  test("one stale version among current ones changes nothing and returns the current row", async () => {
    await testDb()("surfaces").where({ id: surface(2) }).update({ label: "Roof (edited elsewhere)", version: 5 });
    const before = await snapshot(fx.projectId);
    const res = await as("post", `/api/projects/${fx.projectId}/bulk`, {
      changes: [
        { op: "update", sheet: "surfaces", id: surface(0), version: 1, values: { area_m2: 20 } },
        { op: "update", sheet: "surfaces", id: surface(2), version: 1, values: { area_m2: 140 } },
      ],
    });
    expect(res.status).toBe(409);
    expect(res.body.error.details).toHaveLength(1);
    expect(res.body.error.details[0]).toMatchObject({ row: 2, id: surface(2), current: { label: "Roof (edited elsewhere)", version: 5 } });
    expect(await snapshot(fx.projectId)).toEqual(before);
  });

  test("a clean set is applied in one go", async () => {
    const res = await as("post", `/api/projects/${fx.projectId}/bulk`, {
      changes: [
        { op: "update", sheet: "surfaces", id: surface(0), version: 1, values: { area_m2: 20, label: "South wall, widened" } },
        { op: "create", sheet: "surfaces", values: { ...SURFACE_VALUES, label: "South wall 2", zone_id: fx.zoneIds[0], buildup_id: fx.buildupIds.layered } },
      ],
    });
    expect(res.status, res.text).toBe(200);
    expect(res.body.updated[0].row).toMatchObject({ area_m2: 20, version: 2 });
    expect(res.body.created[0].row).toMatchObject({ label: "South wall 2", position: 3, version: 1 });
  });
});

describe("the free plan's 40 rows", () => {
  test("a row that would be the 41st is refused with 402 (bulk and import alike) and nothing is saved", async () => {
    // Expected limit: FREE_PLAN.rowsPerProject = 40 (src/schemas/billing.ts, the product's free plan).
    const p = await makeProject("tarnbrook-sill");
    await clearPlan(p.firmId);
    const extra = Array.from({ length: 35 }, (_, i) => ({ ...SURFACE_VALUES, label: `Filler ${i}`, position: 10 + i, firm_id: p.firmId, project_id: p.projectId, zone_id: p.zoneIds[0], buildup_id: p.buildupIds.layered }));
    await testDb()("surfaces").insert(extra);
    const before = await snapshot(p.projectId);
    const res = await as("post", `/api/projects/${p.projectId}/bulk`, { changes: [{ op: "create", sheet: "surfaces", values: { ...SURFACE_VALUES, zone_id: p.zoneIds[0], buildup_id: p.buildupIds.layered } }] });
    expect(res.status).toBe(402);
    expect(res.body.error).toMatchObject({ code: "plan_limit", details: { limit: "rows", allowed: 40, requested: 41 } });
    const csv = "Label,Zone,Build-up,Area (m²),Tilt (°),Azimuth (°),Centroid height (m),Length along the wind (m),Panel height (m)\nX,Hall,Insulated wall,1,90,0,1,1,1";
    const imported = await request(app.server).post(`/api/projects/${p.projectId}/import?sheet=surfaces`).set(consultant).set("content-type", "text/csv").send(csv);
    expect(imported.status).toBe(402);
    expect(await snapshot(p.projectId)).toEqual(before);
    // Edits of the rows already there stay possible.
    expect((await as("patch", `/api/projects/${p.projectId}/surfaces/${p.surfaceIds[0]}`, { version: 1, area_m2: 3 })).status).toBe(200);
  });
});

describe("projects", () => {
  test("the site and units are updated with the version read; a stale version is refused", async () => {
    const p = await makeProject("tarnbrook-sill");
    const ok = await as("patch", `/api/projects/${p.projectId}`, { version: 1, unit_system: "IP", terrain: "city", altitude_m: 35 });
    expect(ok.status, ok.text).toBe(200);
    expect(ok.body).toMatchObject({ unit_system: "IP", terrain: "city", altitude_m: 35, version: 2 });
    const stale = await as("patch", `/api/projects/${p.projectId}`, { version: 1, terrain: "water" });
    expect(stale.status).toBe(409);
    expect(stale.body.error.details[0].current).toMatchObject({ terrain: "city", version: 2 });
    const bad = await as("patch", `/api/projects/${p.projectId}`, { version: 2, terrain: "moor" });
    expect(bad.status).toBe(422);
    expect(bad.body.error.details[0]).toEqual({ field: "body.terrain", message: "Terrain must be one of: city, suburban, open, water" });
    // Only an admin deletes a project.
    expect((await as("delete", `/api/projects/${p.projectId}?version=2`)).status).toBe(403);
    expect((await call(admin, "delete", `/api/projects/${p.projectId}?version=2`)).status).toBe(200);
    expect(await testDb()("surfaces").where({ project_id: p.projectId }).count({ n: "*" })).toEqual([{ n: "0" }]);
  });
});

describe("another firm's ids are not found", () => {
  const paths = () => [
    ["get", `/api/projects/${fx.projectId}`],
    ["get", `/api/projects/${fx.projectId}/schedule`],
    ["get", `/api/projects/${fx.projectId}/results?case=${fx.caseIds.heating}`],
    ["get", `/api/projects/${fx.projectId}/surfaces`],
    ["get", `/api/projects/${fx.projectId}/surfaces/${fx.surfaceIds[1]}`],
    ["get", `/api/projects/${fx.projectId}/zones/${fx.zoneIds[1]}`],
    ["get", `/api/projects/${fx.projectId}/export?format=csv&sheet=surfaces`],
    ["patch", `/api/projects/${fx.projectId}`, { version: 1, name: "Taken over" }],
    ["delete", `/api/projects/${fx.projectId}/duct-runs/${fx.ductRunIds[0]}?version=1`],
    ["post", `/api/projects/${fx.projectId}/bulk`, { changes: [{ op: "delete", sheet: "surfaces", id: fx.surfaceIds[1], version: 1 }] }],
  ] as const;

  test("as the other firm's admin (reads) and consultant token (writes) every call on the demo firm's project answers 404", async () => {
    for (const [method, path, body] of paths()) {
      const res = await call(method === "get" ? otherFirm : otherConsultantToken, method, path, body as object | undefined);
      expect(res.status, `${method} ${path}`).toBe(404);
      expect(res.text).not.toMatch(/Fixture pavilion|Hall|South wall/);
    }
  });

  test("the other firm's own item ids are not found inside the demo firm's project either", async () => {
    const theirs = await makeProject("ostrander-mechanical");
    const res = await as("get", `/api/projects/${fx.projectId}/surfaces/${theirs.surfaceIds[0]}`);
    expect(res.status).toBe(404);
    const cross = await as("get", `/api/projects/${theirs.projectId}/surfaces/${theirs.surfaceIds[0]}`);
    expect(cross.status).toBe(404);
  });
});

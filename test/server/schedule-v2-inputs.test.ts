// The inputs of calculation contract v2 through the schedule API on the built app and the real
// PostgreSQL: cloud cover (design cases), what lies outside a surface, a duct run inside the zone it
// serves and its jacket's solar absorptance. Each is stored, read back, refused out of its rule
// with a 422 naming it (nothing saved, bulk all or nothing), defaults when a create leaves it out,
// and moves the results the way the engine says. Import and export in both unit systems.
import ExcelJS from "exceljs";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startAppWithSessions, type BuiltApp } from "../support/app-with-sessions";
import { closeTestDb, testDb } from "../support/db";
import { DUCT_VALUES, makeProject, snapshot, SURFACE_VALUES } from "../support/schedule-fixtures";

let app: BuiltApp;
let consultant: Record<string, string>;

beforeAll(async () => {
  const started = await startAppWithSessions(["consultant@demo.filmsheet.test"]);
  app = started.app;
  consultant = started.as["consultant@demo.filmsheet.test"];
});
afterAll(async () => {
  await app?.close();
  await closeTestDb();
});

type Method = "get" | "post" | "patch";
const as = (method: Method, path: string, body?: object) => {
  const req = request(app.server)[method](path).set(consultant);
  return body === undefined ? req : req.send(body);
};
type Row = { row_id: string; result: Record<string, any> };
const results = async (projectId: string, caseId: string) => {
  const res = await as("get", `/api/projects/${projectId}/results?case=${caseId}`);
  expect(res.status, res.text).toBe(200);
  return res.body as { surfaces: Row[]; duct_runs: Row[]; zones: Record<string, any>[] };
};
const fieldsOf = (res: request.Response) => res.body.error.details.map((d: { field: string; message: string }) => ({ field: d.field, message: d.message }));
const text = (res: request.Response) => String(res.body);
const exportCsv = (projectId: string, sheet: string) =>
  as("get", `/api/projects/${projectId}/export?format=csv&sheet=${sheet}`).buffer(true).parse((res, cb) => {
    let t = "";
    res.on("data", (c: Buffer) => (t += c.toString("utf8")));
    res.on("end", () => cb(null, t));
  });
const upload = (projectId: string, query: string, body: string | Buffer, type = "text/csv") =>
  request(app.server).post(`/api/projects/${projectId}/import?${query}`).set(consultant).set("content-type", type).send(body);
const strip = (rows: Record<string, unknown>[]) => rows.map(({ id: _i, created_at: _c, updated_at: _u, version: _v, ...r }) => r);

describe("cloud cover of a design case", () => {
  test("defaults to 0 on create, is saved exactly, warms the sky of an outdoor duct, and is refused outside 0…1 naming it", async () => {
    const p = await makeProject("tarnbrook-sill");
    const base = `/api/projects/${p.projectId}/design-cases`;
    const created = await as("post", base, { name: "Spring check", kind: "heating", T_outdoor_C: 4, RH_outdoor_pct: 80, V_met_m_s: 5, wind_from_deg: 200, solar_W_m2: {} });
    expect(created.status, created.text).toBe(201);
    expect(created.body.cloud_cover).toBe(0);
    expect((await as("get", `${base}/${p.caseIds.heating}`)).body.cloud_cover).toBe(0);

    // Fixture duct run 0 crosses the roof in the outdoor air: under cloud the sky it radiates to
    // is warmer, so its heating air loses less (Q_W, heat gained by the air, is less negative).
    const duct = async () => (await results(p.projectId, p.caseIds.heating)).duct_runs.find((d) => d.row_id === p.ductRunIds[0])!.result;
    const clear = await duct();
    expect(clear.ok, JSON.stringify(clear)).toBe(true);
    const patched = await as("patch", `${base}/${p.caseIds.heating}`, { version: 1, cloud_cover: 0.8 });
    expect(patched.status, patched.text).toBe(200);
    expect(patched.body).toMatchObject({ cloud_cover: 0.8, version: 2 });
    expect(await testDb()("design_cases").where({ id: p.caseIds.heating }).first("cloud_cover")).toEqual({ cloud_cover: 0.8 });
    const cloudy = await duct();
    expect(clear.Q_W).toBeLessThan(0);
    expect(cloudy.Q_W).toBeGreaterThan(clear.Q_W);

    const stored = await snapshot(p.projectId);
    for (const [bad, message] of [
      [1.2, "Cloud cover must be between 0 and 1"],
      [-0.1, "Cloud cover must be between 0 and 1"],
      ["overcast", "Cloud cover must be a number"],
      [null, "Cloud cover must be a number"],
    ] as const) {
      const res = await as("patch", `${base}/${p.caseIds.heating}`, { version: 2, cloud_cover: bad });
      expect(res.status, String(bad)).toBe(422);
      expect(fieldsOf(res)).toEqual([{ field: "cloud_cover", message }]);
    }
    const badCreate = await as("post", base, { name: "Fog", kind: "heating", T_outdoor_C: 1, RH_outdoor_pct: 99, V_met_m_s: 1, wind_from_deg: 0, solar_W_m2: {}, cloud_cover: 2 });
    expect(badCreate.status).toBe(422);
    expect(fieldsOf(badCreate)).toEqual([{ field: "cloud_cover", message: "Cloud cover must be between 0 and 1" }]);
    expect(await snapshot(p.projectId)).toEqual(stored);
  });
});

describe("what lies outside a surface", () => {
  test("rows are over outside air unless told; over ground the row is not computed and leaves the totals; a bad value is refused", async () => {
    const p = await makeProject("tarnbrook-sill");
    const item = `/api/projects/${p.projectId}/surfaces/${p.surfaceIds[0]}`;
    expect((await as("get", item)).body.exposed_to).toBe("outside_air");
    const created = await as("post", `/api/projects/${p.projectId}/surfaces`, { ...SURFACE_VALUES, label: "East wall", zone_id: p.zoneIds[0], buildup_id: p.buildupIds.layered });
    expect(created.status, created.text).toBe(201);
    expect(created.body.exposed_to).toBe("outside_air");

    const before = await results(p.projectId, p.caseIds.heating);
    const row = before.surfaces.find((s) => s.row_id === p.surfaceIds[0])!.result;
    const hall = (r: typeof before) => r.zones.find((z) => z.zone_id === p.zoneIds[0])!;
    expect(row.ok).toBe(true);
    expect(row.Q_W).toBeGreaterThan(0);

    const patched = await as("patch", item, { version: 1, exposed_to: "ground" });
    expect(patched.status, patched.text).toBe(200);
    expect(patched.body).toMatchObject({ exposed_to: "ground", version: 2 });
    expect(await testDb()("surfaces").where({ id: p.surfaceIds[0] }).first("exposed_to")).toEqual({ exposed_to: "ground" });
    const after = await results(p.projectId, p.caseIds.heating);
    expect(after.surfaces.find((s) => s.row_id === p.surfaceIds[0])!.result).toMatchObject({ ok: false, error: { code: "not_computed", field: "exposed_to" } });
    expect(hall(after).surfaces_loss_W).toBeCloseTo(hall(before).surfaces_loss_W - row.Q_W, 6);

    const stored = await snapshot(p.projectId);
    for (const bad of ["water", null, 1]) {
      const res = await as("patch", item, { version: 2, exposed_to: bad });
      expect(res.status).toBe(422);
      expect(fieldsOf(res)).toEqual([{ field: "exposed_to", message: "Outside of surface must be one of: outside_air, ground" }]);
    }
    expect(await snapshot(p.projectId)).toEqual(stored);
  });
});

describe("a duct run inside the zone it serves, and its jacket in the sun", () => {
  test("both default on create, are saved, move the results as the engine says, and are refused out of rule", async () => {
    const p = await makeProject("tarnbrook-sill");
    const base = `/api/projects/${p.projectId}/duct-runs`;
    const created = await as("post", base, { ...DUCT_VALUES, label: "Second roof run", zone_id: p.zoneIds[1] });
    expect(created.status, created.text).toBe(201);
    expect(created.body).toMatchObject({ in_served_zone: false, jacket_absorptance: null });

    // Sun on the jacket (cooling case, 800 W/m² on the horizontal): a darker jacket warms the
    // cold supply air more than the default 0.6 (blank).
    const run = async (caseId: string) => (await results(p.projectId, caseId)).duct_runs.find((d) => d.row_id === p.ductRunIds[0])!.result;
    const blank = await run(p.caseIds.cooling);
    const dark = await as("patch", `${base}/${p.ductRunIds[0]}`, { version: 1, jacket_absorptance: 0.9 });
    expect(dark.status, dark.text).toBe(200);
    expect(dark.body).toMatchObject({ jacket_absorptance: 0.9, in_served_zone: false, version: 2 });
    expect((await run(p.caseIds.cooling)).Q_W).toBeGreaterThan(blank.Q_W);

    // Inside the zone it serves: its heat stays in the Hall, so the zone's distribution loss
    // leaves it out and reports it on its own (heat given to the zone = −Q_W of the air).
    const inZone = await as("patch", `${base}/${p.ductRunIds[0]}`, { version: 2, in_served_zone: true });
    expect(inZone.status, inZone.text).toBe(200);
    expect(await testDb()("duct_runs").where({ id: p.ductRunIds[0] }).first("in_served_zone", "jacket_absorptance")).toEqual({ in_served_zone: true, jacket_absorptance: 0.9 });
    const heating = await results(p.projectId, p.caseIds.heating);
    const q = heating.duct_runs.find((d) => d.row_id === p.ductRunIds[0])!.result.Q_W as number;
    const hall = heating.zones.find((z) => z.zone_id === p.zoneIds[0])!;
    expect(q).toBeLessThan(0);
    expect(hall.ducts_loss_W).toBe(0);
    expect(hall.ducts_in_zone_W).toBeCloseTo(-q, 9);

    const stored = await snapshot(p.projectId);
    const cases: [object, { field: string; message: string }][] = [
      [{ in_served_zone: "yes" }, { field: "in_served_zone", message: "Inside the zone it serves must be true or false" }],
      [{ in_served_zone: null }, { field: "in_served_zone", message: "Inside the zone it serves must be true or false" }],
      [{ jacket_absorptance: 1.5 }, { field: "jacket_absorptance", message: "Jacket solar absorptance must be between 0 and 1" }],
      [{ jacket_absorptance: "dark" }, { field: "jacket_absorptance", message: "Jacket solar absorptance must be a number" }],
    ];
    for (const [change, problem] of cases) {
      const res = await as("patch", `${base}/${p.ductRunIds[0]}`, { version: 3, ...change });
      expect(res.status, JSON.stringify(change)).toBe(422);
      expect(fieldsOf(res)).toEqual([problem]);
    }
    // Bulk: one good change and one bad, all or nothing.
    const bulk = await as("post", `/api/projects/${p.projectId}/bulk`, {
      changes: [
        { op: "update", sheet: "surfaces", id: p.surfaceIds[1], version: 1, values: { exposed_to: "ground" } },
        { op: "update", sheet: "duct_runs", id: p.ductRunIds[1], version: 1, values: { jacket_absorptance: -0.1 } },
      ],
    });
    expect(bulk.status).toBe(422);
    expect(fieldsOf(bulk)).toEqual([{ field: "jacket_absorptance", message: "Jacket solar absorptance must be between 0 and 1" }]);
    expect(await snapshot(p.projectId)).toEqual(stored);
  });
});

describe("import and export of the v2 inputs", () => {
  test("a CSV export in IP (a surface over ground, a run in its zone with a jacket absorptance) imports back to the same rows", async () => {
    const p = await makeProject("tarnbrook-sill");
    const db = testDb();
    await db("projects").where({ id: p.projectId }).update({ unit_system: "IP" });
    await db("surfaces").where({ id: p.surfaceIds[1] }).update({ exposed_to: "ground" });
    await db("duct_runs").where({ id: p.ductRunIds[1] }).update({ in_served_zone: true, jacket_absorptance: 0.35 });
    for (const sheet of ["surfaces", "duct_runs"] as const) {
      const before = strip(await db(sheet).where({ project_id: p.projectId }).orderBy("position"));
      const csv = await exportCsv(p.projectId, sheet);
      expect(csv.status).toBe(200);
      if (sheet === "surfaces") expect(text(csv).split("\r\n")[0]).toContain("Build-up,Outside of surface,Area (ft²)");
      else expect(text(csv)).toMatch(/Location,Inside the zone it serves,.*Jacket emissivity,Jacket solar absorptance,/);
      expect(text(csv)).toContain(sheet === "surfaces" ? ",Ground," : ",Yes,");
      const res = await upload(p.projectId, `sheet=${sheet}&mode=replace`, text(csv));
      expect(res.status, res.text).toBe(200);
      const after = strip(await db(sheet).where({ project_id: p.projectId }).orderBy("position"));
      expect(after).toHaveLength(before.length);
      after.forEach((row, i) => {
        for (const [k, v] of Object.entries(before[i]!)) {
          if (typeof v === "number") expect(row[k], k).toBeCloseTo(v, 6);
          else expect(row[k], k).toEqual(v);
        }
      });
    }
  });

  test("XLSX: Yes/No, TRUE/FALSE cells and labels are read; blanks and a file without the columns take the defaults", async () => {
    const p = await makeProject("tarnbrook-sill");
    const wb = new ExcelJS.Workbook();
    const SURF = ["Label", "Zone", "Build-up", "Area (m²)", "Tilt (°)", "Azimuth (°)", "Centroid height (m)", "Length along the wind (m)", "Panel height (m)", "Outside of surface"];
    wb.addWorksheet("Surfaces").addRows([SURF, ["Slab", "Hall", "Insulated wall", 150, 180, 0, 0, 12, 12, "Ground"], ["Wall", "Hall", "Insulated wall", 10, 90, 0, 2, 4, 3, null]]);
    const DUCT = ["Label", "Zone", "Shape", "Diameter (mm)", "Length (m)", "Airflow (m³/s)", "Entering air, heating (°C)", "Entering air, cooling (°C)", "Location", "Inside the zone it serves", "Insulation (mm)", "Insulation conductivity (W/(m·K))", "Jacket emissivity", "Jacket solar absorptance", "Condensation margin (K)"];
    wb.addWorksheet("Duct runs").addRows([
      DUCT,
      ["In hall", "Hall", "Round", 400, 10, 0.5, 30, 14, "Indoors", "Yes", 0, 0.035, 0.3, null, 0],
      ["Roof", "Hall", "Round", 400, 10, 0.5, 30, 14, "Outdoors", false, 50, 0.035, 0.1, 0.25, 1],
      ["Void", "Office", "Round", 400, 10, 0.5, 30, 14, "Indoors", true, 25, 0.035, 0.9, null, 1],
    ]);
    const res = await upload(p.projectId, "mode=replace", Buffer.from(await wb.xlsx.writeBuffer()), "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet");
    expect(res.status, res.text).toBe(200);
    expect(await testDb()("surfaces").where({ project_id: p.projectId }).orderBy("position").pluck("exposed_to")).toEqual(["ground", "outside_air"]);
    expect(await testDb()("duct_runs").where({ project_id: p.projectId }).orderBy("position").select("in_served_zone", "jacket_absorptance")).toEqual([
      { in_served_zone: true, jacket_absorptance: null },
      { in_served_zone: false, jacket_absorptance: 0.25 },
      { in_served_zone: true, jacket_absorptance: null },
    ]);

    // A file from before the columns existed: not "missing", and every row takes the defaults.
    const old = ["Label,Zone,Build-up,Area (m²),Tilt (°),Azimuth (°),Centroid height (m),Length along the wind (m),Panel height (m)", "Gable,Office,Insulated wall,8,90,90,3,4,3"].join("\n");
    const oldRes = await upload(p.projectId, "sheet=surfaces&mode=replace", old);
    expect(oldRes.status, oldRes.text).toBe(200);
    expect(await testDb()("surfaces").where({ project_id: p.projectId }).pluck("exposed_to")).toEqual(["outside_air"]);
  });

  test("bad v2 cells are reported by row, column and message, and nothing is imported", async () => {
    const p = await makeProject("tarnbrook-sill");
    const before = await snapshot(p.projectId);
    const surfaces = ["Label,Zone,Build-up,Area (m²),Tilt (°),Azimuth (°),Centroid height (m),Length along the wind (m),Panel height (m),Outside of surface", "Pond wall,Hall,Insulated wall,8,90,90,3,4,3,Water"].join("\n");
    const s = await upload(p.projectId, "sheet=surfaces&mode=replace", surfaces);
    expect(s.status).toBe(422);
    expect(s.body.error.details).toEqual([{ sheet: "surfaces", row: 2, column: "Outside of surface", field: "exposed_to", message: "Outside of surface must be one of: Outside air, Ground" }]);
    const ducts = [
      "Label,Zone,Shape,Diameter (mm),Length (m),Airflow (m³/s),Entering air heating (°C),Entering air cooling (°C),Location,Inside the zone it serves,Insulation (mm),Insulation conductivity (W/(m·K)),Jacket emissivity,Jacket solar absorptance,Condensation margin (K)",
      "A,Hall,Round,400,10,0.5,30,14,Indoors,maybe,0,0.035,0.3,,0",
      "B,Hall,Round,400,10,0.5,30,14,Outdoors,No,50,0.035,0.1,1.4,1",
    ].join("\n");
    const d = await upload(p.projectId, "sheet=duct_runs&mode=append", ducts);
    expect(d.status).toBe(422);
    expect(d.body.error.details).toEqual([
      { sheet: "duct_runs", row: 2, column: "Inside the zone it serves", field: "in_served_zone", message: "Inside the zone it serves must be Yes or No" },
      { sheet: "duct_runs", row: 3, column: "Jacket solar absorptance", field: "jacket_absorptance", message: "Jacket solar absorptance must be between 0 and 1" },
    ]);
    expect(await snapshot(p.projectId)).toEqual(before);
  });

  test("the template's Read me says what a blank means in the new columns", async () => {
    const p = await makeProject("tarnbrook-sill");
    const res = await as("get", `/api/projects/${p.projectId}/export?format=xlsx&template=1`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on("data", (c: Buffer) => chunks.push(c));
      r.on("end", () => cb(null, Buffer.concat(chunks)));
    });
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(res.body as unknown as ArrayBuffer);
    const readMe = wb.getWorksheet("Read me")!.getSheetValues().map((r) => (Array.isArray(r) ? r.slice(1) : []));
    expect(readMe).toEqual(
      expect.arrayContaining([
        ["Surfaces: Outside of surface", "one of: Outside air, Ground; blank = Outside air"],
        ["Duct runs: Inside the zone it serves", "one of: Yes, No; blank = No"],
        ["Duct runs: Jacket solar absorptance", "blank = 0.6"],
      ]),
    );
  });
});

describe("a revision issued before the v2 inputs existed", () => {
  test("reads with the defaults their absence means, and compares with a later revision without phantom changes", async () => {
    const { buildSnapshot } = await import("../../src/checking/build-snapshot");
    const { loadSnapshotInputs } = await import("../../src/server/repositories/snapshot-inputs");
    const p = await makeProject("tarnbrook-sill");
    const inputs = (await loadSnapshotInputs(testDb(), p.firmId, p.projectId))!;
    // Revision A as it was frozen before the migration: the same rows without the v2 keys.
    const drop = <T extends object>(rows: T[], keys: string[]) => rows.map((r) => Object.fromEntries(Object.entries(r).filter(([k]) => !keys.includes(k))));
    const old = {
      ...inputs,
      design_cases: drop(inputs.design_cases, ["cloud_cover"]),
      surfaces: drop(inputs.surfaces, ["exposed_to"]),
      duct_runs: drop(inputs.duct_runs, ["in_served_zone", "jacket_absorptance"]),
    } as unknown as typeof inputs;
    const a = buildSnapshot(old);
    expect(JSON.stringify(a)).not.toMatch(/cloud_cover|exposed_to|in_served_zone|jacket_absorptance/);
    const b = buildSnapshot(inputs);
    await testDb()("revisions").insert([
      { firm_id: p.firmId, project_id: p.projectId, sequence: 1, letter: "A", issued_by_name: "Test", note: "", snapshot: JSON.stringify(a) },
      { firm_id: p.firmId, project_id: p.projectId, sequence: 2, letter: "B", issued_by_name: "Test", note: "", snapshot: JSON.stringify(b) },
    ]);
    const rev = await as("get", `/api/projects/${p.projectId}/revisions/A`);
    expect(rev.status, rev.text).toBe(200);
    expect(rev.body.snapshot.design_cases.map((d: { cloud_cover: number }) => d.cloud_cover)).toEqual([0, 0]);
    expect(rev.body.snapshot.surfaces.map((s: { exposed_to: string }) => s.exposed_to)).toEqual(["outside_air", "outside_air", "outside_air"]);
    expect(rev.body.snapshot.duct_runs.map((d: Record<string, unknown>) => [d.in_served_zone, d.jacket_absorptance])).toEqual([[false, null], [false, null]]);
    // The stored revision itself is as it was issued.
    expect(JSON.stringify((await testDb()("revisions").where({ project_id: p.projectId, letter: "A" }).first("snapshot")).snapshot)).not.toContain("cloud_cover");
    const cmp = await as("get", `/api/projects/${p.projectId}/revisions/compare?from=A&to=B`);
    expect(cmp.status, cmp.text).toBe(200);
    expect(cmp.body.rows.changed.filter((r: { fields: unknown[] }) => r.fields.length > 0)).toEqual([]);
    expect(cmp.body.settings).toEqual([]);
  });
});

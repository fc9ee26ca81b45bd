// Import and export of schedules on the built app and the real PostgreSQL: CSV and XLSX, headings
// matched by name and unit, every row checked, one transaction (a single bad row saves nothing
// and is reported by row, column and message), templates and a round trip.
import ExcelJS from "exceljs";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { exclusionsSentence } from "../../src/calc/index";
import { startAppWithSessions, type BuiltApp } from "../support/app-with-sessions";
import { closeTestDb, testDb } from "../support/db";
import { makeProject, snapshot, type FixtureProject } from "../support/schedule-fixtures";

let app: BuiltApp;
let consultant: Record<string, string>;
let fx: FixtureProject;

beforeAll(async () => {
  const started = await startAppWithSessions(["consultant@demo.filmsheet.test"]);
  app = started.app;
  consultant = started.as["consultant@demo.filmsheet.test"];
  fx = await makeProject("tarnbrook-sill");
});
afterAll(async () => {
  await app?.close();
  await closeTestDb();
});

const upload = (projectId: string, query: string, body: string | Buffer, type = "text/csv") =>
  request(app.server).post(`/api/projects/${projectId}/import?${query}`).set(consultant).set("content-type", type).send(body);
const surfacesOf = (projectId: string) => testDb()("surfaces").where({ project_id: projectId }).orderBy("position");

const SI_HEAD = "Label,Zone,Build-up,Area (m²),Tilt (°),Azimuth (°),Centroid height (m),Length along the wind (m),Panel height (m),Method,Absorptance,Emissivity";

describe("CSV import", () => {
  test("good rows in SI are added after the existing ones", async () => {
    const p = await makeProject("tarnbrook-sill");
    const csv = [SI_HEAD, "East wall,Hall,Insulated wall,10,90,90,2.5,4,3,,,", "Roof light kerb,office,ROOF PANEL,3.2,45,180,6.5,2,1.5,ISO 6946 linear,0.4,0.88"].join("\n");
    const res = await upload(p.projectId, "sheet=surfaces", csv);
    expect(res.status, res.text).toBe(200);
    expect(res.body).toEqual({ imported: { surfaces: 2 }, replaced: {}, ignored_columns: {} });
    const rows = await surfacesOf(p.projectId);
    expect(rows).toHaveLength(5);
    expect(rows[3]).toMatchObject({ label: "East wall", zone_id: p.zoneIds[0], buildup_id: p.buildupIds.layered, area_m2: 10, method: null, absorptance: null, position: 3 });
    expect(rows[4]).toMatchObject({ label: "Roof light kerb", zone_id: p.zoneIds[1], buildup_id: p.buildupIds.direct, tilt_deg: 45, method: "iso6946", absorptance: 0.4 });
  });

  test("IP headings are converted to SI on the way in", async () => {
    const p = await makeProject("tarnbrook-sill");
    const csv = ["label,zone,buildup,Area (ft²),tilt_deg,azimuth_deg,Centroid height (ft),Length along the wind (ft),Panel height (ft)", "North wall,Hall,Insulated wall,100,90,0,10,20,12"].join("\r\n");
    const res = await upload(p.projectId, "sheet=surfaces&mode=replace", csv);
    expect(res.status, res.text).toBe(200);
    const [row] = await surfacesOf(p.projectId);
    // Expected from the exact definitions 1 ft = 0.3048 m, 1 ft² = 0.09290304 m² (NIST SP 811).
    expect(row.area_m2).toBeCloseTo(9.290304, 9);
    expect(row.height_m).toBeCloseTo(3.048, 9);
    expect(row.length_m).toBeCloseTo(6.096, 9);
    expect(row.panel_height_m).toBeCloseTo(3.6576, 9);
  });

  test("one bad row saves nothing and every problem is reported by row, column and message", async () => {
    const before = await snapshot(fx.projectId);
    const csv = [
      SI_HEAD,
      "Good wall,Hall,Insulated wall,10,90,90,2.5,4,3,,,",
      "Bad area,Hall,Insulated wall,abc,90,90,2.5,4,3,,,",
      "Unknown zone,Attic,Insulated wall,10,90,90,2.5,4,3,,,",
      "Steep,Hall,Insulated wall,10,200,90,2.5,4,3,,,",
      "Bad method,Hall,Insulated wall,10,90,90,2.5,4,3,sideways,,",
    ].join("\n");
    for (const mode of ["append", "replace"]) {
      const res = await upload(fx.projectId, `sheet=surfaces&mode=${mode}`, csv);
      expect(res.status).toBe(422);
      expect(res.body.error.message).toBe("4 problems in 4 rows of Surfaces; nothing was imported");
      expect(res.body.error.details).toEqual([
        { sheet: "surfaces", row: 3, column: "Area (m²)", field: "area_m2", message: 'Area (m²): "abc" is not a number' },
        { sheet: "surfaces", row: 4, column: "Zone", field: "zone_id", message: 'No zone named "Attic" in this project (there are: Hall, Office)' },
        { sheet: "surfaces", row: 5, column: "Tilt (°)", field: "tilt_deg", message: "Tilt must be between 0° and 180°" },
        { sheet: "surfaces", row: 6, column: "Method", field: "method", message: "Method must be one of: Boundary layer, ISO 6946 linear, McAdams wind formula" },
      ]);
      expect(await snapshot(fx.projectId)).toEqual(before);
    }
  });

  test("a missing required column is named; extra columns are ignored and listed", async () => {
    const missing = await upload(fx.projectId, "sheet=surfaces", "Label,Zone,Area (m²)\nX,Hall,3");
    expect(missing.status).toBe(422);
    expect(missing.body.error.details.map((d: { column: string }) => d.column)).toEqual(["Build-up", "Tilt", "Azimuth", "Centroid height", "Length along the wind", "Panel height"]);
    const p = await makeProject("tarnbrook-sill");
    const extra = await upload(p.projectId, "sheet=surfaces", `${SI_HEAD},Notes\nWall,Hall,Insulated wall,1,90,0,1,1,1,,,,check on site`);
    expect(extra.status, extra.text).toBe(200);
    expect(extra.body.ignored_columns).toEqual({ surfaces: ["Notes"] });
  });
});

describe("XLSX import, export and templates", () => {
  test("a workbook with Surfaces and Duct runs worksheets imports both in one go", async () => {
    const p = await makeProject("tarnbrook-sill");
    const wb = new ExcelJS.Workbook();
    wb.addWorksheet("Surfaces").addRows([SI_HEAD.split(","), ["Gable", "Office", "Insulated wall", 18, 90, 270, 4, 6, 5, null, null, null]]);
    wb.addWorksheet("Duct runs").addRows([
      ["Label", "Zone", "Shape", "Diameter (mm)", "Width (mm)", "Height (mm)", "Length (m)", "Airflow (m³/s)", "Entering air, heating (°C)", "Entering air, cooling (°C)", "Location", "Surrounding air (°C)", "Surrounding air, cooling (°C)", "Insulation (mm)", "Insulation conductivity (W/(m·K))", "Jacket emissivity", "Condensation margin (K)"],
      ["Plant drop", "Hall", "Round", 315, null, null, 6, 0.3, 30, 14, "Indoors", 18, 27, 25, 0.035, 0.9, 1],
    ]);
    const res = await upload(p.projectId, "mode=replace", Buffer.from(await wb.xlsx.writeBuffer()), "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet");
    expect(res.status, res.text).toBe(200);
    expect(res.body.imported).toEqual({ surfaces: 1, duct_runs: 1 });
    const duct = await testDb()("duct_runs").where({ project_id: p.projectId }).first();
    // Millimetres in the heading → metres stored.
    expect(duct).toMatchObject({ label: "Plant drop", shape: "round", diameter_m: 0.315, insulation_thickness_m: 0.025, location: "indoor", T_surround_C: 18, T_surround_cooling_C: 27, elevation_m: null });
  });

  test("CSV export, edited nowhere, imports back (replace) to the same rows", async () => {
    const p = await makeProject("tarnbrook-sill");
    await testDb()("projects").where({ id: p.projectId }).update({ unit_system: "IP" });
    // One void with a summer temperature of its own, so the column makes the trip in °F (80.6 °F).
    await testDb()("duct_runs").where({ id: p.ductRunIds[1] }).update({ T_surround_cooling_C: 27 });
    const strip = (rows: Record<string, unknown>[]) => rows.map(({ id: _i, created_at: _c, updated_at: _u, version: _v, ...r }) => r);
    const before = strip(await testDb()("duct_runs").where({ project_id: p.projectId }).orderBy("position"));
    const csv = await request(app.server).get(`/api/projects/${p.projectId}/export?format=csv&sheet=duct_runs`).set(consultant).buffer(true).parse((res, cb) => {
      let text = "";
      res.on("data", (c: Buffer) => (text += c.toString("utf8")));
      res.on("end", () => cb(null, text));
    });
    expect(csv.status).toBe(200);
    expect(csv.headers["content-disposition"]).toMatch(/attachment; filename=".*-schedule-duct_runs\.csv"/);
    expect(String(csv.body)).toContain("Airflow (cfm)");
    expect(String(csv.body)).toContain("Surrounding air, cooling (°F)");
    const res = await upload(p.projectId, "sheet=duct_runs&mode=replace", String(csv.body));
    expect(res.status, res.text).toBe(200);
    const after = strip(await testDb()("duct_runs").where({ project_id: p.projectId }).orderBy("position"));
    expect(after).toHaveLength(before.length);
    after.forEach((row, i) => {
      for (const [k, v] of Object.entries(before[i]!)) {
        if (typeof v === "number") expect(row[k], k).toBeCloseTo(v, 6);
        else expect(row[k], k).toEqual(v);
      }
    });
  });

  test("the XLSX template holds the headings of both sheets and a Read me; the export carries results for a case", async () => {
    const get = (q: string) =>
      request(app.server).get(`/api/projects/${fx.projectId}/export?${q}`).set(consultant).buffer(true).parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on("data", (c: Buffer) => chunks.push(c));
        res.on("end", () => cb(null, Buffer.concat(chunks)));
      });
    const template = await get("format=xlsx&template=1");
    expect(template.status).toBe(200);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(template.body as unknown as ArrayBuffer);
    expect(wb.worksheets.map((w) => w.name)).toEqual(["Surfaces", "Duct runs", "Read me"]);
    expect(wb.getWorksheet("Surfaces")!.rowCount).toBe(1);
    // Label, Zone, Build-up, Outside of surface, then the numbers.
    expect(wb.getWorksheet("Surfaces")!.getRow(1).getCell(5).value).toBe("Area (m²)");
    expect((wb.getWorksheet("Duct runs")!.getRow(1).values as string[]).slice(1)).toContain("Surrounding air, cooling (°C)");
    const readMe = wb.getWorksheet("Read me")!.getSheetValues().map((r) => (Array.isArray(r) ? r.slice(1) : []));
    expect(readMe).toContainEqual(["Duct runs: Surrounding air, cooling (°C)", "blank = as heating"]);

    const full = await get(`format=xlsx&case=${fx.caseIds.heating}`);
    const wb2 = new ExcelJS.Workbook();
    await wb2.xlsx.load(full.body as unknown as ArrayBuffer);
    const ws = wb2.getWorksheet("Surfaces")!;
    expect(ws.rowCount).toBe(1 + (await surfacesOf(fx.projectId)).length);
    const headings = (ws.getRow(1).values as string[]).slice(1);
    expect(headings).toContain("Heat loss (W) — Winter");
    // v2: the bands as least and greatest columns, the method-sensitive flag and the inside surface.
    for (const h of ["h_o across methods, least (W/(m²·K)) — Winter", "Q across methods, greatest (W) — Winter", "Method-sensitive (> 10 %) — Winter", "Inside surface T_si (°C) — Winter", "Inside surface — Winter"]) expect(headings).toContain(h);
    const sensitiveCol = headings.indexOf("Method-sensitive (> 10 %) — Winter") + 1;
    for (let i = 2; i <= ws.rowCount; i++) expect(String(ws.getRow(i).getCell(sensitiveCol).value)).toMatch(/^(yes|no)( · \d+ %)?$/);
    // The zone totals sheet: fabric and distribution apart, and what every total leaves out.
    const totals = wb2.getWorksheet("Zone totals")!;
    expect((totals.getRow(1).values as string[]).slice(1)).toEqual(expect.arrayContaining(["Fabric loss (W)", "Distribution loss (W)", "Distribution gain (W)"]));
    const texts = totals.getSheetValues().flatMap((r) => (Array.isArray(r) ? r.slice(1) : [])).map(String);
    expect(texts).toContain(exclusionsSentence());
    // The breakdowns of every case beside them, with each zone's peak case named.
    expect(wb2.worksheets.map((w) => w.name)).toEqual(["Surfaces", "Duct runs", "Zone totals", "Breakdowns", "Read me"]);
    const breakdowns = wb2.getWorksheet("Breakdowns")!.getSheetValues().flatMap((r) => (Array.isArray(r) ? r.slice(1) : [])).map(String);
    for (const t of ["Peak case of each zone", "Not in these totals"]) expect(breakdowns).toContain(t);
    expect(breakdowns.some((t) => t.startsWith("By element type"))).toBe(true);
  });
});

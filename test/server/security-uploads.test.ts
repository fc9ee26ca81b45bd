// What one hostile upload or body must not do, on the built app and the real PostgreSQL: a huge
// cell, a 32 MB file of them, XLSX bombs (far columns, declared and lying sizes), bodies without
// a content-length, an oversize webhook or sign-in post, and formulae in CSV exports. Each costs
// the sender a 4xx, saves nothing, and the app answers the next request as usual.
import { request as httpRequest } from "node:http";
import { deflateRawSync } from "node:zlib";
import ExcelJS from "exceljs";
import Papa from "papaparse";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startAppWithSessions, type BuiltApp } from "../support/app-with-sessions";
import { closeTestDb, testDb } from "../support/db";
import { makeProject, snapshot, type FixtureProject } from "../support/schedule-fixtures";
import { farColumnSheet, makeZip, xlsxParts } from "../support/zip";

let app: BuiltApp;
let consultant: Record<string, string>;
let fx: FixtureProject;
let port: number;

beforeAll(async () => {
  const started = await startAppWithSessions(["consultant@demo.filmsheet.test"]);
  app = started.app;
  consultant = started.as["consultant@demo.filmsheet.test"];
  port = (app.server.address() as { port: number }).port;
  fx = await makeProject("tarnbrook-sill");
});
afterAll(async () => {
  await app?.close();
  await closeTestDb();
});

const XLSX = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";
const upload = (projectId: string, query: string, body: string | Buffer, type = "text/csv") =>
  request(app.server).post(`/api/projects/${projectId}/import?${query}`).set(consultant).set("content-type", type).send(body);
const HEAD = ["Label", "Zone", "Build-up", "Area (m²)", "Tilt (°)", "Azimuth (°)", "Centroid height (m)", "Length along the wind (m)", "Panel height (m)"];
// 100 KB of digits ending in a letter: the old number pattern backtracked over one for ~13 s.
const HOSTILE_NUMBER = `${"1".repeat(100_000)}x`;

async function expectStillServing(): Promise<void> {
  const health = await request(app.server).get("/api/health");
  expect(health.status).toBe(200);
  expect((await request(app.server).get(`/api/projects/${fx.projectId}/schedule`).set(consultant)).status).toBe(200);
}

describe("huge cells", () => {
  test("a 100 KB number cell is refused at once, naming its row and column; nothing is saved", async () => {
    const before = await snapshot(fx.projectId);
    const csv = [HEAD.join(","), `Wall,Hall,Insulated wall,${HOSTILE_NUMBER},90,0,2,4,3`].join("\n");
    const res = await upload(fx.projectId, "sheet=surfaces", csv);
    expect(res.status).toBe(422);
    expect(res.body.error.details).toEqual([{ sheet: "surfaces", row: 2, column: "Area (m²)", field: "area_m2", message: "Area (m²): the cell is longer than 64 characters, the most a number may have" }]);
    expect(await snapshot(fx.projectId)).toEqual(before);
    await expectStillServing();
  });

  // The old code would take hours here; the test timeout is the guard, not a timed assertion.
  test("a 32 MB upload of such cells is a 422 listing every row, and the app answers afterwards", { timeout: 60_000 }, async () => {
    const rows = Array.from({ length: 320 }, (_, i) => `W${i},Hall,Insulated wall,${HOSTILE_NUMBER},90,0,2,4,3`);
    const csv = [HEAD.join(","), ...rows].join("\n");
    expect(csv.length).toBeGreaterThan(32_000_000);
    expect(csv.length).toBeLessThan(32 * 1024 * 1024);
    const res = await upload(fx.projectId, "sheet=surfaces", csv);
    expect(res.status).toBe(422);
    expect(res.body.error.message).toBe("320 problems in 320 rows of Surfaces; nothing was imported");
    await expectStillServing();
  });

  test("more rows than an import reads is a 413 naming the limit", async () => {
    const rows = Array.from({ length: 20_001 }, (_, i) => `W${i},Hall,Insulated wall,1,90,0,2,4,3`);
    const res = await upload(fx.projectId, "sheet=surfaces", [HEAD.join(","), ...rows].join("\n"));
    expect(res.status).toBe(413);
    expect(res.body.error.message).toBe("Surfaces: more than 20,000 rows; import at most that many at a time");
  });
});

describe("XLSX bombs", () => {
  test("one cell per row in column XFD (100 KB zipped, 327 million cells as a table) is a 413 from its dimension", async () => {
    const bytes = makeZip(xlsxParts("Surfaces", farColumnSheet(HEAD, 19_999, true)));
    expect(bytes.byteLength).toBeLessThan(200_000);
    const res = await upload(fx.projectId, "mode=replace", bytes, XLSX);
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/^A worksheet spans A1:XFD20000, reaching column 16,384 and row 20,000; an import reads at most 512 columns and 20,000 rows/);
    await expectStillServing();
  });

  test("the same bomb without a dimension is refused by the reader in its worker", async () => {
    const before = await snapshot(fx.projectId);
    const res = await upload(fx.projectId, "mode=replace", makeZip(xlsxParts("Surfaces", farColumnSheet(HEAD, 19_999, false))), XLSX);
    expect(res.status).toBe(413);
    expect(res.body.error.message).toBe("Surfaces: row 2 reaches column 16384; an import reads at most 512 columns");
    expect(await snapshot(fx.projectId)).toEqual(before);
    await expectStillServing();
  });

  test("an archive declaring gigabytes unpacked is refused before anything is inflated", async () => {
    const res = await upload(fx.projectId, "", makeZip(xlsxParts("Surfaces", "<worksheet/>", { declaredSize: 3_000_000_000 })), XLSX);
    expect(res.status).toBe(413);
    expect(res.body.error.message).toBe("The workbook unpacks to 2,861 MB; an import reads at most 64 MB unpacked");
  });

  test("a real compression bomb (128 MB of zeros in 130 KB) is refused from its declared size", async () => {
    const zeros = Buffer.alloc(128 * 1024 * 1024);
    const bytes = makeZip(xlsxParts("Surfaces", zeros, { deflated: deflateRawSync(zeros) }));
    expect(bytes.byteLength).toBeLessThan(200_000);
    const res = await upload(fx.projectId, "", bytes, XLSX);
    expect(res.status).toBe(413);
    expect(res.body.error.message).toBe("The workbook unpacks to 128 MB; an import reads at most 64 MB unpacked");
  });

  // Within every size limit (20,000 rows, 120 columns, ~63 MB unpacked), yet 2.4 million cells:
  // more than the reader's heap holds. The worker dies, not the app.
  test("a workbook within the size limits that needs more memory than a reader may use is a 413", { timeout: 120_000 }, async () => {
    const cols = Array.from({ length: 120 }, (_, i) => (i < 26 ? String.fromCharCode(65 + i) : String.fromCharCode(64 + Math.floor(i / 26)) + String.fromCharCode(65 + (i % 26))));
    const rows: string[] = [];
    for (let r = 1; r <= 20_000; r++) rows.push(`<row r="${r}">${cols.map((c) => `<c r="${c}${r}"><v>1</v></c>`).join("")}</row>`);
    const xml = `<?xml version="1.0" encoding="UTF-8"?><worksheet xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main"><dimension ref="A1:DP20000"/><sheetData>${rows.join("")}</sheetData></worksheet>`;
    expect(xml.length).toBeLessThan(64 * 1024 * 1024);
    const res = await upload(fx.projectId, "", makeZip(xlsxParts("Surfaces", xml)), XLSX);
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/^(Reading the file needs more than the 512 MB an import may use|The file took longer than 30 s to read)/);
    await expectStillServing();
  });

  test("a part that unpacks to more than it declares is refused at its declared size", async () => {
    const zeros = Buffer.alloc(32 * 1024 * 1024);
    const res = await upload(fx.projectId, "", makeZip(xlsxParts("Surfaces", zeros, { declaredSize: 2048, deflated: deflateRawSync(zeros) })), XLSX);
    expect(res.status).toBe(413);
    expect(res.body.error.message).toBe("A part of the workbook (xl/worksheets/sheet1.xml) unpacks to more than the 2048 bytes it declares; the file is refused");
    await expectStillServing();
  });
});

describe("every body is read through a cap", () => {
  test("a chunked upload (no content-length) past 32 MB gets its 413 while it is still being sent", { timeout: 60_000 }, async () => {
    const limit = 32 * 1024 * 1024;
    const chunk = Buffer.alloc(256 * 1024, "1");
    const result = await new Promise<{ status: number; body: string; sentWhenAnswered: number }>((resolve, reject) => {
      let sent = 0;
      let answeredAt = -1;
      const req = httpRequest({ host: "127.0.0.1", port, method: "POST", path: `/api/projects/${fx.projectId}/import?sheet=surfaces`, headers: { ...consultant, "content-type": "text/csv" } });
      req.on("response", (res) => {
        answeredAt = sent;
        let body = "";
        res.on("data", (c: Buffer) => (body += c.toString("utf8")));
        res.on("end", () => {
          req.destroy();
          resolve({ status: res.statusCode!, body, sentWhenAnswered: answeredAt });
        });
      });
      req.on("error", (error) => (answeredAt < 0 ? reject(error) : undefined));
      // Keeps sending until answered, up to three times the limit: a server that buffers the whole
      // body answers only after the last byte.
      const pump = () => {
        while (answeredAt < 0 && sent < 3 * limit) {
          sent += chunk.byteLength;
          if (!req.write(chunk)) return void req.once("drain", pump);
        }
        if (answeredAt < 0) req.end();
      };
      pump();
    });
    expect(result.status).toBe(413);
    expect(JSON.parse(result.body).error).toEqual({ code: "payload_too_large", message: `File larger than ${limit} bytes` });
    expect(result.sentWhenAnswered).toBeGreaterThan(limit);
    expect(result.sentWhenAnswered).toBeLessThan(3 * limit);
    await expectStillServing();
  });

  test("a Stripe webhook body over 1 MB is a 413 before any signature check", async () => {
    const res = await request(app.server).post("/api/webhooks/stripe").set("content-type", "application/json").set("stripe-signature", "t=1,v1=00").send(JSON.stringify({ id: "evt_x", pad: "x".repeat(2 * 1024 * 1024) }));
    expect(res.status).toBe(413);
    expect(res.body.error).toEqual({ code: "payload_too_large", message: "Webhook body larger than 1048576 bytes" });
  });

  test("a sign-in post over 64 KB is a 413 and never reaches Auth.js", async () => {
    const res = await request(app.server)
      .post("/api/auth/callback/credentials")
      .type("form")
      .send({ email: "consultant@demo.filmsheet.test", password: "x".repeat(100 * 1024), csrfToken: "x" });
    expect(res.status).toBe(413);
    expect(res.body.error).toEqual({ code: "payload_too_large", message: "Sign-in request larger than 65536 bytes" });
    const attempts = await testDb()("sign_in_attempts").where({ email: "consultant@demo.filmsheet.test" }).where("created_at", ">", new Date(Date.now() - 5000));
    expect(attempts).toEqual([]);
  });
});

describe("exports never carry live formulae", () => {
  const FORMULA = '=HYPERLINK("http://evil.example","open")';

  test("CSV: formula-like text gets a leading quote, numbers stay numbers, and the file imports back unchanged", async () => {
    const p = await makeProject("tarnbrook-sill");
    await testDb()("duct_runs").where({ id: p.ductRunIds[0] }).update({ label: FORMULA });
    await testDb()("duct_runs").where({ id: p.ductRunIds[1] }).update({ label: "@SUM(A1:A9)", T_surround_C: -5 });
    await testDb()("zones").where({ id: p.zoneIds[0] }).update({ name: "+Plant deck" });
    const strip = (rows: Record<string, unknown>[]) => rows.map(({ id: _i, created_at: _c, updated_at: _u, version: _v, ...r }) => r);
    const before = strip(await testDb()("duct_runs").where({ project_id: p.projectId }).orderBy("position"));

    const res = await request(app.server).get(`/api/projects/${p.projectId}/export?format=csv&sheet=duct_runs`).set(consultant).buffer(true).parse((r, cb) => {
      let text = "";
      r.on("data", (c: Buffer) => (text += c.toString("utf8")));
      r.on("end", () => cb(null, text));
    });
    expect(res.status).toBe(200);
    const text = String(res.body);
    const [head, first, second] = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), { skipEmptyLines: true }).data;
    const cell = (row: string[], title: string) => row[head!.indexOf(title)];
    expect(cell(first!, "Label")).toBe(`'${FORMULA}`);
    expect(cell(first!, "Zone")).toBe("'+Plant deck");
    expect(cell(second!, "Label")).toBe("'@SUM(A1:A9)");
    expect(cell(second!, "Surrounding air (°C)")).toBe("-5");
    // Unquoted in the file: a spreadsheet reads it as the number −5.
    expect(text).toMatch(/,-5,/);

    const back = await upload(p.projectId, "sheet=duct_runs&mode=replace", text);
    expect(back.status, back.text).toBe(200);
    const after = strip(await testDb()("duct_runs").where({ project_id: p.projectId }).orderBy("position"));
    expect(after.map((r) => r.label)).toEqual([FORMULA, "@SUM(A1:A9)"]);
    expect(after[1]!.T_surround_C).toBe(-5);
    expect(after.map((r) => r.zone_id)).toEqual(before.map((r) => r.zone_id));
  });

  test("XLSX: formula-like text is a text cell, never a formula", async () => {
    const p = await makeProject("tarnbrook-sill");
    await testDb()("surfaces").where({ id: p.surfaceIds[0] }).update({ label: FORMULA });
    const res = await request(app.server).get(`/api/projects/${p.projectId}/export?format=xlsx`).set(consultant).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on("data", (c: Buffer) => chunks.push(c));
      r.on("end", () => cb(null, Buffer.concat(chunks)));
    });
    expect(res.status).toBe(200);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(res.body as unknown as ArrayBuffer);
    const cell = wb.getWorksheet("Surfaces")!.getCell("A2");
    expect(cell.type).toBe(ExcelJS.ValueType.String);
    expect(cell.value).toBe(FORMULA);
    expect(cell.formula).toBeUndefined();
  });
});

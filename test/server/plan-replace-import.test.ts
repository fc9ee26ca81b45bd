// The free plan's row limit on imports, on the built app and the real PostgreSQL: a sheet exported,
// edited and imported back in place of itself is the same schedule, so it is allowed whenever it
// does not add rows; appending, or a replace that grows past the limit, is refused (402) and
// nothing is saved.
import { randomUUID } from "node:crypto";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { newFirmAdmin } from "../support/billing";
import { startBuiltApp } from "../support/built-app";
import { closeTestDb, testDb } from "../support/db";
import { makeProject, snapshot, SURFACE_VALUES, type FixtureProject } from "../support/schedule-fixtures";

let app: Awaited<ReturnType<typeof startBuiltApp>>;
let origin: string;

beforeAll(async () => {
  app = await startBuiltApp();
  origin = `http://127.0.0.1:${(app.server.address() as { port: number }).port}`;
});
afterAll(async () => {
  await app?.close();
  await closeTestDb();
});

/** A free firm (through the public sign-up) whose one project holds `surfaces` surfaces and the fixture's two duct runs. */
async function freeProject(surfaces: number): Promise<{ fx: FixtureProject; headers: Record<string, string> }> {
  const firm = await newFirmAdmin(app.server, origin);
  const { slug } = await testDb()("firms").where({ id: firm.firmId }).first("slug");
  const fx = await makeProject(slug);
  const more = Array.from({ length: surfaces - fx.surfaceIds.length }, (_, i) => ({
    ...SURFACE_VALUES,
    id: randomUUID(),
    firm_id: fx.firmId,
    project_id: fx.projectId,
    label: `Panel ${i + 4}`,
    position: i + 3,
    zone_id: fx.zoneIds[i % 2],
    buildup_id: fx.buildupIds.layered,
  }));
  if (more.length) await testDb()("surfaces").insert(more);
  return { fx, headers: firm.headers };
}

const text = (res: request.Response, cb: (err: Error | null, body: string) => void) => {
  let body = "";
  res.on("data", (c: Buffer) => (body += c.toString("utf8")));
  res.on("end", () => cb(null, body));
};
const exportCsv = async (fx: FixtureProject, headers: Record<string, string>) => {
  const res = await request(app.server).get(`/api/projects/${fx.projectId}/export?format=csv&sheet=surfaces&case=${fx.caseIds.heating}`).set(headers).buffer(true).parse(text);
  expect(res.status).toBe(200);
  return String(res.body);
};
const upload = (fx: FixtureProject, headers: Record<string, string>, mode: "append" | "replace", csv: string) =>
  request(app.server).post(`/api/projects/${fx.projectId}/import?sheet=surfaces&mode=${mode}`).set(headers).set("content-type", "text/csv").send(csv);
const rowCount = async (fx: FixtureProject) =>
  Number((await testDb()("surfaces").where({ project_id: fx.projectId }).count({ n: "*" }))[0]!.n) + Number((await testDb()("duct_runs").where({ project_id: fx.projectId }).count({ n: "*" }))[0]!.n);
/** The exported sheet with the first row's area changed (an edit made in a spreadsheet). */
const edited = (csv: string) => {
  const lines = csv.split(/\r?\n/);
  lines[1] = lines[1]!.replace(/,12\.5,/, ",14,");
  return lines.join("\n");
};
const dropLast = (csv: string) => {
  const lines = csv.trimEnd().split(/\r?\n/);
  return lines.slice(0, -1).join("\n");
};

describe("replacing a sheet on the free plan", () => {
  test("export, edit, import back in place of the sheet: allowed at the same number of rows; appending the same file is refused", async () => {
    const { fx, headers } = await freeProject(30);
    const csv = await exportCsv(fx, headers);
    expect(edited(csv)).not.toBe(csv);
    const res = await upload(fx, headers, "replace", edited(csv));
    expect(res.status, res.text).toBe(200);
    expect(res.body).toMatchObject({ imported: { surfaces: 30 }, replaced: { surfaces: 30 } });
    expect(await rowCount(fx)).toBe(32);
    expect(await testDb()("surfaces").where({ project_id: fx.projectId, label: "South wall" }).first("area_m2")).toEqual({ area_m2: 14 });

    const before = await snapshot(fx.projectId);
    const append = await upload(fx, headers, "append", csv);
    expect(append.status).toBe(402);
    expect(append.body.error.message).toMatch(/free plan holds 40 rows per project \(this change would make 62\)/);
    expect(await snapshot(fx.projectId)).toEqual(before);
  });

  test("a project already over the limit (a firm that stopped paying) may still replace its sheet with as many rows or fewer, but not grow", async () => {
    const { fx, headers } = await freeProject(43);
    expect(await rowCount(fx)).toBe(45);
    const csv = await exportCsv(fx, headers);

    const same = await upload(fx, headers, "replace", edited(csv));
    expect(same.status, same.text).toBe(200);
    expect(await rowCount(fx)).toBe(45);

    const fewer = await upload(fx, headers, "replace", dropLast(csv));
    expect(fewer.status, fewer.text).toBe(200);
    expect(await rowCount(fx)).toBe(44);

    // Back to 43 surfaces from 42: one more row than the project holds now, over the limit.
    const before = await snapshot(fx.projectId);
    const grows = await upload(fx, headers, "replace", csv);
    expect(grows.status).toBe(402);
    expect(grows.body.error.message).toMatch(/free plan holds 40 rows per project \(this change would make 45\)/);
    expect(grows.body.error.details).toMatchObject({ limit: "rows", allowed: 40, requested: 45 });
    expect(await snapshot(fx.projectId)).toEqual(before);
  });
});

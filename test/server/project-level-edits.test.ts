// Project-level changes (a design case, the site, a zone, a build-up) on the built app and the real
// PostgreSQL: they send the rows they feed back to unchecked, but do not make their author the
// rows' last editor, so a consultant who is also a checker may still check rows they never edited.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startAppWithSessions, type BuiltApp } from "../support/app-with-sessions";
import { makeMember, stateOf } from "../support/checking";
import { closeTestDb, testDb } from "../support/db";
import { makeProject, type FixtureProject } from "../support/schedule-fixtures";
import { sessionCookie } from "../support/sessions";

const PASSWORD = process.env.DEMO_PASSWORD || "filmsheet-demo";
let app: BuiltApp;
let consultant: Record<string, string>;
let checker: Record<string, string>;
let dual: Record<string, string>;
let consultantId: number;
let checkerId: number;

beforeAll(async () => {
  const started = await startAppWithSessions(["consultant@demo.filmsheet.test", "checker@demo.filmsheet.test"] as const);
  app = started.app;
  consultant = started.as["consultant@demo.filmsheet.test"];
  checker = started.as["checker@demo.filmsheet.test"];
  const member = await makeMember("tarnbrook-sill", ["consultant", "checker"], "Project level engineer");
  dual = { cookie: await sessionCookie(app.server, member.email, PASSWORD), origin: consultant.origin! };
  consultantId = (await testDb()("users").where({ email: "consultant@demo.filmsheet.test" }).first("id")).id;
  checkerId = (await testDb()("users").where({ email: "checker@demo.filmsheet.test" }).first("id")).id;
});

afterAll(async () => {
  await app?.close();
  await closeTestDb();
});

const api = (fx: FixtureProject, path = "") => `/api/projects/${fx.projectId}${path}`;
const lastEditor = async (fx: FixtureProject, sheet: "surfaces" | "duct_runs", id: string) =>
  ((await testDb()("row_checks").where({ project_id: fx.projectId, sheet, row_id: id }).first("last_edited_by")) ?? { last_edited_by: null }).last_edited_by as number | null;
const rowVersion = async (sheet: string, id: string) => (await testDb()(sheet).where({ id }).first("version")).version as number;

/** Every row of the fixture accepted by the demo checker, as a checked schedule would be. */
async function acceptEveryRow(fx: FixtureProject): Promise<void> {
  for (const [sheet, ids] of [["surfaces", fx.surfaceIds], ["duct_runs", fx.ductRunIds]] as const) {
    await testDb()("row_checks").insert(ids.map((row_id) => ({ firm_id: fx.firmId, project_id: fx.projectId, sheet, row_id, state: "accepted", checked_by: checkerId, checked_at: new Date(), checked_row_version: 1 })));
  }
}

// [what changes, the request, the surfaces (by index) it drops to unchecked]. The fixture puts
// surfaces 0 and 1 (the layered build-up) in zone 0, surface 2 in zone 1.
const CHANGES: [string, (fx: FixtureProject) => [method: "patch" | "post", path: string, body: object], number[]][] = [
  ["a design case", (fx) => ["patch", api(fx, `/design-cases/${fx.caseIds.heating}`), { version: 1, T_outdoor_C: -5 }], [0, 1, 2]],
  [
    "a new design case",
    (fx) => ["post", api(fx, "/design-cases"), { name: "Cold snap", kind: "heating", T_outdoor_C: -10, RH_outdoor_pct: 90, V_met_m_s: 6, wind_from_deg: 45, solar_W_m2: {}, cloud_cover: 0 }],
    [0, 1, 2],
  ],
  ["the site", (fx) => ["patch", api(fx), { version: 1, altitude_m: 450 }], [0, 1, 2]],
  ["a zone", (fx) => ["patch", api(fx, `/zones/${fx.zoneIds[0]}`), { version: 1, T_heating_C: 19 }], [0, 1]],
  ["a build-up", (fx) => ["patch", api(fx, `/buildups/${fx.buildupIds.layered}`), { version: 1, emissivity: 0.85 }], [0, 1]],
];

describe("a project-level change resets checks without claiming the rows", () => {
  test.each(CHANGES)("changing %s: its rows drop to unchecked, nobody becomes their editor, and its author may check them", async (_what, req, dropped) => {
    const fx = await makeProject("tarnbrook-sill");
    await acceptEveryRow(fx);
    const [method, path, body] = req(fx);
    const res = await request(app.server)[method](path).set(dual).send(body);
    expect(res.status, res.text).toBeLessThan(300);
    for (const [i, id] of fx.surfaceIds.entries()) {
      expect(await stateOf(fx.projectId, "surfaces", id), `surface ${i}`).toBe(dropped.includes(i) ? "unchecked" : "accepted");
      expect(await lastEditor(fx, "surfaces", id), `surface ${i}'s last editor`).toBeNull();
    }
    // The engineer who changed the project checks a row it dropped: allowed, as they never edited it.
    const row = fx.surfaceIds[dropped[0]!]!;
    const check = await request(app.server).post(api(fx, `/surfaces/${row}/check`)).set(dual).send({ move: "accept", row_version: await rowVersion("surfaces", row) });
    expect(check.status, check.text).toBe(200);
    expect(await stateOf(fx.projectId, "surfaces", row)).toBe("accepted");
  });

  test("a row's own last editor stays its last editor through a later project-level change", async () => {
    const fx = await makeProject("tarnbrook-sill");
    await acceptEveryRow(fx);
    const [edited, untouched] = [fx.surfaceIds[0]!, fx.surfaceIds[1]!];
    expect((await request(app.server).patch(api(fx, `/surfaces/${edited}`)).set(consultant).send({ version: 1, area_m2: 13 })).status).toBe(200);
    expect(await lastEditor(fx, "surfaces", edited)).toBe(consultantId);
    expect((await request(app.server).patch(api(fx, `/design-cases/${fx.caseIds.cooling}`)).set(dual).send({ version: 1, T_outdoor_C: 32 })).status).toBe(200);
    expect(await lastEditor(fx, "surfaces", edited)).toBe(consultantId);
    expect(await lastEditor(fx, "surfaces", untouched)).toBeNull();
    expect(await stateOf(fx.projectId, "surfaces", untouched)).toBe("unchecked");
    // The consultant still may not check the row they edited; the project-level author may.
    const board = await request(app.server).post(api(fx, "/checks")).set(dual).send({ filter: "Unchecked · Surfaces", confirmed_count: 2, rows: [{ sheet: "surfaces", id: edited, row_version: 2 }, { sheet: "surfaces", id: untouched, row_version: 1 }] });
    expect(board.status, board.text).toBe(200);
    expect(board.body).toEqual({ accepted: 2 });
    const own = await request(app.server).post(api(fx, `/surfaces/${edited}/check`)).set(checker).send({ move: "query", comment: "Area from the revised drawing?", row_version: 2 });
    expect(own.status, own.text).toBe(200);
  });

  test("editing a row still makes its editor the last editor, who may not check it", async () => {
    const fx = await makeProject("tarnbrook-sill");
    const row = fx.ductRunIds[0]!;
    expect((await request(app.server).patch(api(fx, `/duct-runs/${row}`)).set(dual).send({ version: 1, length_m: 14 })).status).toBe(200);
    expect(await lastEditor(fx, "duct_runs", row)).not.toBeNull();
    const res = await request(app.server).post(api(fx, `/duct-runs/${row}/check`)).set(dual).send({ move: "accept", row_version: 2 });
    expect(res.status, res.text).toBe(403);
    expect(res.body.error.message).toMatch(/You last edited this duct run/);
  });
});

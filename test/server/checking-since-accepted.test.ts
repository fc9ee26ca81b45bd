// On the built app and the real PostgreSQL: what a row was computed from is kept when it is
// accepted, and once a change sends it back the working says what changed since (before → after);
// accepting the rows shown needs the filter and the confirmed count, and records on every row, in
// its check and in its history, that it was accepted in bulk; the check view's filters.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { backfillAcceptances } from "../../db/migrations/20261214120000_row_check_acceptance";
import { inputChanges, rowInputs, type AcceptedInputs, type InputSources } from "../../src/checking/accepted-inputs";
import { startAppWithSessions, type BuiltApp } from "../support/app-with-sessions";
import { auditOf } from "../support/checking";
import { closeTestDb, testDb } from "../support/db";
import { makeProject, type FixtureProject } from "../support/schedule-fixtures";

type Who = "consultant@demo.filmsheet.test" | "checker@demo.filmsheet.test";
let app: BuiltApp;
let as: Record<Who, Record<string, string>>;
const CONSULTANT = "consultant@demo.filmsheet.test";
const CHECKER = "checker@demo.filmsheet.test";

beforeAll(async () => {
  ({ app, as } = await startAppWithSessions([CONSULTANT, CHECKER] as const));
});
afterAll(async () => {
  await app?.close();
  await closeTestDb();
});

const api = (fx: FixtureProject) => `/api/projects/${fx.projectId}`;
const check = async (fx: FixtureProject, sheet: "surfaces" | "duct_runs", id: string) => testDb()("row_checks").where({ project_id: fx.projectId, sheet, row_id: id }).first();
const version = async (sheet: string, id: string) => (await testDb()(sheet).where({ id }).first("version")).version as number;
const everyRow = async (fx: FixtureProject) => [
  ...(await Promise.all(fx.surfaceIds.map(async (id) => ({ sheet: "surfaces", id, row_version: await version("surfaces", id) })))),
  ...(await Promise.all(fx.ductRunIds.map(async (id) => ({ sheet: "duct_runs", id, row_version: await version("duct_runs", id) })))),
];

async function acceptOne(fx: FixtureProject, sheet: "surfaces" | "duct_runs", id: string) {
  const res = await request(app.server).post(`${api(fx)}/${sheet === "surfaces" ? "surfaces" : "duct-runs"}/${id}/check`).set(as[CHECKER]).send({ move: "accept", row_version: await version(sheet, id) });
  expect(res.status, res.text).toBe(200);
}

describe("what changed since the row was accepted", () => {
  test("accepting keeps the inputs; an edit of the row and of its zone shows before → after at the top of its working", async () => {
    const fx = await makeProject("tarnbrook-sill");
    const id = fx.surfaceIds[0]!;
    await acceptOne(fx, "surfaces", id);
    const kept = await check(fx, "surfaces", id);
    expect(kept).toMatchObject({ state: "accepted", accepted_in_bulk: false, accepted_row_version: 1 });
    expect(kept.accepted_inputs.row).toMatchObject({ label: "South wall", area_m2: 12.5 });
    expect(kept.accepted_inputs.zone).toMatchObject({ name: "Hall", T_heating_C: 20 });
    expect(kept.accepted_inputs.buildup.layers).toHaveLength(2);
    expect(kept.accepted_inputs.design_cases.map((d: { name: string }) => d.name).sort()).toEqual(["Summer", "Winter"]);

    // While accepted, the working has nothing "since".
    let working = await request(app.server).get(`${api(fx)}/surfaces/${id}/working`).set(as[CHECKER]);
    expect(working.status, working.text).toBe(200);
    expect(working.body.since_accepted).toBeNull();

    const patch = await request(app.server).patch(`${api(fx)}/surfaces/${id}`).set(as[CONSULTANT]).send({ version: 1, area_m2: 14 });
    expect(patch.status, patch.text).toBe(200);
    const zone = await request(app.server).patch(`${api(fx)}/zones/${fx.zoneIds[0]}`).set(as[CONSULTANT]).send({ version: 1, T_heating_C: 22 });
    expect(zone.status, zone.text).toBe(200);
    const reset = await check(fx, "surfaces", id);
    expect(reset.state).toBe("unchecked");
    // The last acceptance outlives the reset.
    expect(reset.accepted_inputs).toEqual(kept.accepted_inputs);

    working = await request(app.server).get(`${api(fx)}/surfaces/${id}/working`).set(as[CHECKER]);
    expect(working.body.since_accepted).toMatchObject({ accepted_by_name: expect.any(String), in_bulk: false, row_version: 1 });
    expect(working.body.since_accepted.changes).toEqual([
      { heading: "This surface", fields: [{ label: "Area", before: "12.50 m²", after: "14.00 m²" }] },
      { heading: "Zone Hall", fields: [{ label: "Heating set point", before: "20.0 °C", after: "22.0 °C" }] },
    ]);

    // Accepted again: the new acceptance replaces the old one, and nothing is "since" any more.
    await acceptOne(fx, "surfaces", id);
    expect((await check(fx, "surfaces", id)).accepted_inputs.row.area_m2).toBe(14);
    working = await request(app.server).get(`${api(fx)}/surfaces/${id}/working`).set(as[CHECKER]);
    expect(working.body.since_accepted).toBeNull();
  });

  test("a row queried after it was accepted and changed still shows the change; a design case added shows too", async () => {
    const fx = await makeProject("tarnbrook-sill");
    const id = fx.ductRunIds[0]!;
    await acceptOne(fx, "duct_runs", id);
    const dc = await request(app.server).post(`${api(fx)}/design-cases`).set(as[CONSULTANT]).send({ name: "Still night", kind: "heating", T_outdoor_C: -8, RH_outdoor_pct: 95, V_met_m_s: 0, wind_from_deg: 0, solar_W_m2: {} });
    expect(dc.status, dc.text).toBe(201);
    const q = await request(app.server).post(`${api(fx)}/duct-runs/${id}/check`).set(as[CHECKER]).send({ move: "query", row_version: await version("duct_runs", id), comment: "Which case governs now?" });
    expect(q.status, q.text).toBe(200);
    const working = await request(app.server).get(`${api(fx)}/duct-runs/${id}/working`).set(as[CHECKER]);
    expect(working.body.check.state).toBe("queried");
    expect(working.body.since_accepted.changes).toEqual([{ heading: "Design case Still night", note: "added since the row was accepted", fields: [] }]);
  });

  test("the migration gives rows accepted before it their inputs as stored now", async () => {
    const fx = await makeProject("tarnbrook-sill");
    const checker = await testDb()("users").where({ email: CHECKER }).first("id");
    await testDb()("row_checks").insert({ firm_id: fx.firmId, project_id: fx.projectId, sheet: "surfaces", row_id: fx.surfaceIds[0], state: "accepted", checked_by: checker.id, checked_at: new Date(), checked_row_version: 1 });
    const db = testDb();
    // In a transaction rolled back: the backfill touches every accepted row of the database.
    await db
      .transaction(async (trx) => {
        await trx.raw(backfillAcceptances("surfaces"));
        const c = await trx("row_checks").where({ project_id: fx.projectId, row_id: fx.surfaceIds[0] }).first();
        expect(c).toMatchObject({ accepted_by: checker.id, accepted_row_version: 1, accepted_in_bulk: false });
        // The same inputs the app keeps at an acceptance: nothing differs.
        const row = await trx("surfaces").where({ id: fx.surfaceIds[0] }).first();
        const from = {
          project: await trx("projects").where({ id: fx.projectId }).first(),
          zones: await trx("zones").where({ project_id: fx.projectId }),
          buildups: [{ ...(await trx("buildups").where({ id: fx.buildupIds.layered }).first()), layers: await trx("buildup_layers").where({ buildup_id: fx.buildupIds.layered }).orderBy("position").select("material", "thickness_m", "k_W_mK") }],
          design_cases: await trx("design_cases").where({ project_id: fx.projectId }),
        } as unknown as InputSources;
        expect(inputChanges(c.accepted_inputs as AcceptedInputs, rowInputs("surfaces", row, from))).toEqual([]);
        expect(c.accepted_inputs.buildup.layers.map((l: { material: string }) => l.material)).toEqual(["Brick", "Mineral wool"]);
        throw new Error("roll back");
      })
      .catch((e: Error) => expect(e.message).toBe("roll back"));
  });
});

describe("accepting the rows shown, in bulk", () => {
  test("recorded on every row: its check, its audit row with the filter and count, its history", async () => {
    const fx = await makeProject("tarnbrook-sill");
    const rows = await everyRow(fx);
    const res = await request(app.server).post(`${api(fx)}/checks`).set(as[CHECKER]).send({ rows, filter: "Unchecked · Surfaces", confirmed_count: rows.length });
    expect(res.status, res.text).toBe(200);
    expect(res.body).toEqual({ accepted: 5 });
    for (const r of rows) {
      const c = await check(fx, r.sheet as "surfaces", r.id);
      expect(c).toMatchObject({ state: "accepted", accepted_in_bulk: true, accepted_row_version: r.row_version });
      expect(c.accepted_inputs.row.id).toBe(r.id);
    }
    const audits = await auditOf(fx.projectId, { entity: "row_check", action: "accept" });
    expect(audits).toHaveLength(5);
    for (const a of audits) expect(a.after.bulk).toEqual({ rows: 5, filter: "Unchecked · Surfaces" });
    const history = await request(app.server).get(`${api(fx)}/surfaces/${fx.surfaceIds[1]}/history`).set(as[CONSULTANT]);
    expect(history.body.entries[0]).toMatchObject({ action: "accept", after: expect.objectContaining({ bulk: { rows: 5, filter: "Unchecked · Surfaces" } }) });
    // The board says so, and a single accept afterwards is not "in bulk".
    const board = await request(app.server).get(`${api(fx)}/checks`).set(as[CHECKER]);
    expect(board.body.rows.every((r: { accepted_in_bulk: boolean }) => r.accepted_in_bulk)).toBe(true);
  });

  test.each([
    ["a count that is not the number of rows sent", (rows: unknown[]) => ({ rows, filter: "All rows", confirmed_count: rows.length + 1 }), "body.confirmed_count", /confirmed_count is 6 but 5 rows were sent/],
    ["no count", (rows: unknown[]) => ({ rows, filter: "All rows" }), "body.confirmed_count", /confirmed_count is required/],
    ["no filter", (rows: unknown[]) => ({ rows, confirmed_count: rows.length }), "body.filter", /filter/],
  ])("refused with %s: 422 naming the field, and no row accepted", async (_what, body, field, message) => {
    const fx = await makeProject("tarnbrook-sill");
    const res = await request(app.server).post(`${api(fx)}/checks`).set(as[CHECKER]).send(body(await everyRow(fx)));
    expect(res.status, res.text).toBe(422);
    const detail = res.body.error.details.find((d: { field: string }) => d.field === field);
    expect(detail?.message).toMatch(message);
    expect(await testDb()("row_checks").where({ project_id: fx.projectId, state: "accepted" }).count({ n: "*" })).toEqual([{ n: "0" }]);
    expect(await auditOf(fx.projectId, { entity: "row_check" })).toEqual([]);
  });
});

describe("the check view's filters", () => {
  test("changed since accepted: rows accepted once and sent back by a change, whatever their state now", async () => {
    const fx = await makeProject("tarnbrook-sill");
    for (const id of fx.surfaceIds) await acceptOne(fx, "surfaces", id);
    await request(app.server).patch(`${api(fx)}/surfaces/${fx.surfaceIds[1]}`).set(as[CONSULTANT]).send({ version: 1, tilt_deg: 80 }).expect(200);
    const board = await request(app.server).get(`${api(fx)}/checks?changed=yes`).set(as[CHECKER]);
    expect(board.status, board.text).toBe(200);
    expect(board.body.rows.map((r: { id: string }) => r.id)).toEqual([fx.surfaceIds[1]]);
    expect(board.body.counts).toMatchObject({ rows: 5, accepted: 2, unchecked: 3, changed: 1 });
    // Duct runs never accepted are unchecked but not "changed since accepted".
    const unchecked = await request(app.server).get(`${api(fx)}/checks?state=unchecked`).set(as[CHECKER]);
    expect(unchecked.body.rows.map((r: { changed_since_accepted: boolean }) => r.changed_since_accepted)).toEqual([true, false, false]);
  });

  test("with warnings: rows whose result has a warning or an error in any design case, each warning in words", async () => {
    const fx = await makeProject("tarnbrook-sill");
    // A surface over the ground is not computed (ISO 13370): flagged in every design case.
    await testDb()("surfaces").where({ id: fx.surfaceIds[2] }).update({ exposed_to: "ground" });
    const all = await request(app.server).get(`${api(fx)}/checks`).set(as[CHECKER]);
    const warned = all.body.rows.filter((r: { warnings: string[] }) => r.warnings.length > 0);
    expect(warned.length).toBeGreaterThan(0);
    expect(all.body.counts.warnings).toBe(warned.length);
    const roof = all.body.rows.find((r: { id: string }) => r.id === fx.surfaceIds[2]);
    expect(roof.warnings).toEqual(expect.arrayContaining([expect.stringMatching(/^Winter: Not computed/), expect.stringMatching(/^Summer: Not computed/)]));
    const filtered = await request(app.server).get(`${api(fx)}/checks?warnings=yes`).set(as[CHECKER]);
    expect(filtered.body.rows.map((r: { id: string }) => r.id)).toEqual(warned.map((r: { id: string }) => r.id));
    const bad = await request(app.server).get(`${api(fx)}/checks?warnings=maybe`).set(as[CHECKER]);
    expect(bad.status).toBe(422);
  });
});

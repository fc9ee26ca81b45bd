// Each person's own view settings (units, folded zone totals, column sets) through
// /api/me/preferences on the built app and the real PostgreSQL: bad input is refused naming the
// field and saves nothing, one person's settings never touch another's, and switching units is
// a view: no project change, no history row, no row marked as edited.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startAppWithSessions, type BuiltApp } from "../support/app-with-sessions";
import { closeTestDb, testDb } from "../support/db";
import { makeProject, snapshot } from "../support/schedule-fixtures";

const EMAILS = ["consultant@demo.filmsheet.test", "checker@demo.filmsheet.test", "admin@demo.filmsheet.test"] as const;
let app: BuiltApp;
let as: Record<(typeof EMAILS)[number], Record<string, string>>;
const ids: Record<string, number> = {};

beforeAll(async () => {
  ({ app, as } = await startAppWithSessions(EMAILS));
  for (const email of EMAILS) ids[email] = (await testDb()("users").where({ email }).first("id")).id;
  await testDb()("user_preferences").whereIn("user_id", Object.values(ids)).delete();
});
afterAll(async () => {
  await app?.close();
  // The demo people go back to no settings of their own: later suites (the browser tests) share this database.
  await testDb()("user_preferences").whereIn("user_id", Object.values(ids)).delete();
  await closeTestDb();
});

const api = () => request(app.server);
const consultant = () => as["consultant@demo.filmsheet.test"];
const checker = () => as["checker@demo.filmsheet.test"];
const stored = (email: string) => testDb()("user_preferences").where({ user_id: ids[email] }).first();
const ownSet = { id: "heat-check", name: "Heat check", sheet: "surfaces", columns: ["label", "area_m2", "r:U_W_m2K", "r:Q_W"] };

describe("reading and saving", () => {
  test("a person without settings reads the defaults; a change is saved and read back", async () => {
    const first = await api().get("/api/me/preferences").set(consultant());
    expect(first.status, first.text).toBe(200);
    expect(first.body).toEqual({ unit_system: null, zone_totals_collapsed: false, active_column_sets: {}, column_sets: [], version: 0 });

    const saved = await api()
      .patch("/api/me/preferences")
      .set(consultant())
      .send({ zone_totals_collapsed: true, column_sets: [ownSet], active_column_sets: { surfaces: "heat-check", duct_runs: "results" } });
    expect(saved.status, saved.text).toBe(200);
    expect(saved.body).toMatchObject({ zone_totals_collapsed: true, active_column_sets: { surfaces: "heat-check", duct_runs: "results" }, version: 1 });
    expect(saved.body.column_sets).toEqual([ownSet]);

    // A later change of one setting keeps the others.
    const again = await api().patch("/api/me/preferences").set(consultant()).send({ unit_system: "IP" });
    expect(again.body).toMatchObject({ unit_system: "IP", zone_totals_collapsed: true, active_column_sets: { surfaces: "heat-check" }, version: 2 });
    expect((await api().get("/api/me/preferences").set(consultant())).body).toEqual(again.body);
  });

  test("deleting the active set falls back to the default set", async () => {
    const res = await api().patch("/api/me/preferences").set(consultant()).send({ column_sets: [] });
    expect(res.status, res.text).toBe(200);
    expect(res.body.active_column_sets).toEqual({ duct_runs: "results" });
    expect(res.body.column_sets).toEqual([]);
  });

  test("a stale version is a conflict and saves nothing", async () => {
    const before = await stored("consultant@demo.filmsheet.test");
    const res = await api().patch("/api/me/preferences").set(consultant()).send({ version: before.version - 1, zone_totals_collapsed: false });
    expect(res.status).toBe(409);
    expect(await stored("consultant@demo.filmsheet.test")).toEqual(before);
  });
});

describe("bad input", () => {
  const cases: [string, unknown, string][] = [
    ["a unit system that is neither SI nor IP", { unit_system: "metric" }, "body.unit_system"],
    ["a folded flag that is not a boolean", { zone_totals_collapsed: "yes" }, "body.zone_totals_collapsed"],
    ["a column the sheet does not have", { column_sets: [{ ...ownSet, columns: ["label", "r:nonsense"] }] }, "body.column_sets.0.columns.1"],
    ["a set without a name", { column_sets: [{ ...ownSet, name: "  " }] }, "body.column_sets.0.name"],
    ["a set named like a built-in one", { column_sets: [{ ...ownSet, name: "Results" }] }, "body.column_sets.0.name"],
    ["two sets of one name on a sheet", { column_sets: [ownSet, { ...ownSet, id: "other" }] }, "body.column_sets.1.name"],
    ["a duct-run set with a surface column", { column_sets: [{ ...ownSet, sheet: "duct_runs" }] }, "body.column_sets.0.columns.1"],
    ["an active set that is not there", { active_column_sets: { surfaces: "someone-elses" } }, "body.active_column_sets.surfaces"],
    ["a field that is not a setting", { unit_system: "SI", project_id: "x" }, "body"],
  ];
  test.each(cases)("%s is refused (422) naming the field, and nothing is saved", async (_what, body, field) => {
    const before = await stored("consultant@demo.filmsheet.test");
    const res = await api().patch("/api/me/preferences").set(consultant()).send(body as object);
    expect(res.status, res.text).toBe(422);
    expect(res.body.error.details.map((d: { field: string }) => d.field)).toContain(field);
    expect(await stored("consultant@demo.filmsheet.test")).toEqual(before);
  });

  test("a body that is not JSON is a 400", async () => {
    const res = await api().patch("/api/me/preferences").set({ ...consultant(), "content-type": "application/json" }).send("{nope");
    expect(res.status).toBe(400);
  });

  test("without a session the settings are not read (401)", async () => {
    expect((await api().get("/api/me/preferences")).status).toBe(401);
  });
});

describe("one person's settings", () => {
  test("never change another person's", async () => {
    const set = await api().patch("/api/me/preferences").set(checker()).send({ unit_system: "SI", active_column_sets: { surfaces: "inputs" } });
    expect(set.status, set.text).toBe(200);
    const checkersBefore = await stored("checker@demo.filmsheet.test");
    const mine = await api().patch("/api/me/preferences").set(consultant()).send({ unit_system: "IP", zone_totals_collapsed: true, active_column_sets: { surfaces: "results" } });
    expect(mine.status).toBe(200);
    expect(await stored("checker@demo.filmsheet.test")).toEqual(checkersBefore);
    expect((await api().get("/api/me/preferences").set(checker())).body).toMatchObject({ unit_system: "SI", zone_totals_collapsed: false, active_column_sets: { surfaces: "inputs" } });
    // Someone who never chose still has no row at all.
    expect(await stored("admin@demo.filmsheet.test")).toBeUndefined();
  });
});

describe("switching units", () => {
  test("changes no project, writes no history row and leaves every row's last editor alone", async () => {
    const fx = await makeProject("tarnbrook-sill");
    const db = testDb();
    // Every surface last edited by the admin: a units switch by the consultant must not claim them.
    await db("row_checks").insert(fx.surfaceIds.map((row_id) => ({ firm_id: fx.firmId, project_id: fx.projectId, sheet: "surfaces", row_id, last_edited_by: ids["admin@demo.filmsheet.test"], last_edited_at: db.fn.now() })));
    const project = () => db("projects").where({ id: fx.projectId }).first();
    const audit = () => db("audit_log").where({ project_id: fx.projectId }).orderBy("id");
    const checks = () => db("row_checks").where({ project_id: fx.projectId }).orderBy("id");
    const before = { project: await project(), audit: await audit(), checks: await checks(), rows: await snapshot(fx.projectId) };

    for (const unit_system of ["IP", "SI", "IP"]) {
      const res = await api().patch("/api/me/preferences").set(consultant()).send({ unit_system });
      expect(res.status, res.text).toBe(200);
    }
    expect(await project()).toEqual(before.project);
    expect(await audit()).toEqual(before.audit);
    expect(await checks()).toEqual(before.checks);
    expect((await checks()).map((c) => c.last_edited_by)).toEqual(fx.surfaceIds.map(() => ids["admin@demo.filmsheet.test"]));
    expect(await snapshot(fx.projectId)).toEqual(before.rows);
    // The history page reads the audit trail: it lists nothing for the switch.
    const history = await api().get(`/api/projects/${fx.projectId}/history`).set(consultant());
    expect(history.status, history.text).toBe(200);
    expect(JSON.stringify(history.body)).not.toMatch(/unit_system/);

    // The project's own units are a project change, and the audit trail would show one.
    const changed = await api().patch(`/api/projects/${fx.projectId}`).set(consultant()).send({ version: before.project.version, unit_system: "IP" });
    expect(changed.status, changed.text).toBe(200);
    expect((await audit()).length).toBe(before.audit.length + 1);
  });
});

// Issued revisions outlive every attempt to delete their project: only admins delete projects,
// never one with an issued revision (409, archive instead); an archived project is read-only,
// left out of the main list, listed with ?archived=1, and brought back by an admin.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startAppWithSessions, type BuiltApp } from "../support/app-with-sessions";
import { clearPlan, grantPaidPlan } from "../support/billing";
import { acceptAll } from "../support/checking";
import { closeTestDb, testDb } from "../support/db";
import { makeProject, SURFACE_VALUES } from "../support/schedule-fixtures";

const EMAILS = ["consultant@demo.filmsheet.test", "checker@demo.filmsheet.test", "admin@demo.filmsheet.test", "admin@other.filmsheet.test"] as const;
let app: BuiltApp;
let as: Record<(typeof EMAILS)[number], Record<string, string>>;
let firmId: string;
let checkerId: number;

beforeAll(async () => {
  ({ app, as } = await startAppWithSessions(EMAILS));
  firmId = (await testDb()("firms").where({ slug: "tarnbrook-sill" }).first("id")).id;
  checkerId = (await testDb()("users").where({ email: "checker@demo.filmsheet.test" }).first("id")).id;
  await grantPaidPlan(firmId);
});
afterAll(async () => {
  await clearPlan(firmId);
  await app?.close();
  await closeTestDb();
});

const api = () => request(app.server);
const admin = () => as["admin@demo.filmsheet.test"];
const consultant = () => as["consultant@demo.filmsheet.test"];
const listed = async (query = "") => ((await api().get(`/api/projects${query}`).set(consultant())).body.projects as { id: string }[]).map((p) => p.id);

describe("deleting a project", () => {
  test("is for admins only: a consultant gets 403 and the project stays", async () => {
    const fx = await makeProject("tarnbrook-sill");
    expect((await api().delete(`/api/projects/${fx.projectId}?version=1`).set(consultant())).status).toBe(403);
    expect(await testDb()("projects").where({ id: fx.projectId }).first("id")).toBeDefined();
    const res = await api().delete(`/api/projects/${fx.projectId}?version=1`).set(admin());
    expect(res.status, res.text).toBe(200);
    expect(await testDb()("projects").where({ id: fx.projectId }).first("id")).toBeUndefined();
  });

  test("with an issued revision is refused (409, archive instead); the revision and its report stay", async () => {
    const fx = await makeProject("tarnbrook-sill");
    await acceptAll(fx.projectId, checkerId);
    const issued = await api().post(`/api/projects/${fx.projectId}/revisions`).set(as["checker@demo.filmsheet.test"]).send({});
    expect(issued.status, issued.text).toBe(201);
    const res = await api().delete(`/api/projects/${fx.projectId}?version=1`).set(admin());
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/archive it instead/);
    expect(await testDb()("revisions").where({ project_id: fx.projectId })).toHaveLength(1);
    const report = await api().get(`/api/projects/${fx.projectId}/revisions/A/report`).set(admin());
    expect(report.status).toBe(200);
  });
});

describe("archiving a project", () => {
  test("hides it from the main list, lists it with ?archived=1, makes it read-only, and an admin brings it back", async () => {
    const fx = await makeProject("tarnbrook-sill");
    const base = `/api/projects/${fx.projectId}`;
    expect((await api().post(`${base}/archive`).set(consultant()).send({ version: 1 })).status).toBe(403);
    expect((await api().post(`${base}/archive`).set(as["admin@other.filmsheet.test"]).send({ version: 1 })).status).toBe(404);
    const stale = await api().post(`${base}/archive`).set(admin()).send({ version: 7 });
    expect(stale.status).toBe(409);

    const archived = await api().post(`${base}/archive`).set(admin()).send({ version: 1 });
    expect(archived.status, archived.text).toBe(200);
    expect(archived.body.archived_at).not.toBeNull();
    expect(await listed()).not.toContain(fx.projectId);
    expect(await listed("?archived=1")).toContain(fx.projectId);
    // Still readable by everyone who read it before.
    expect((await api().get(`${base}/schedule`).set(consultant())).status).toBe(200);

    // Every kind of change is refused, and nothing is saved.
    const before = await testDb()("surfaces").where({ project_id: fx.projectId }).orderBy("id");
    const edits = [
      await api().patch(`${base}/surfaces/${fx.surfaceIds[0]}`).set(consultant()).send({ version: 1, area_m2: 30 }),
      await api().post(`${base}/surfaces`).set(consultant()).send({ ...SURFACE_VALUES, label: "New bay", zone_id: fx.zoneIds[0], buildup_id: fx.buildupIds.direct }),
      await api().patch(base).set(consultant()).send({ version: archived.body.version, altitude_m: 500 }),
      await api().delete(`${base}/surfaces/${fx.surfaceIds[1]}?version=1`).set(consultant()),
    ];
    for (const res of edits) {
      expect(res.status, res.text).toBe(409);
      expect(res.body.error.message).toMatch(/archived, so it is read-only/);
    }
    expect(await testDb()("surfaces").where({ project_id: fx.projectId }).orderBy("id")).toEqual(before);

    expect((await api().delete(`${base}/archive?version=${archived.body.version}`).set(consultant())).status).toBe(403);
    const back = await api().delete(`${base}/archive?version=${archived.body.version}`).set(admin());
    expect(back.status, back.text).toBe(200);
    expect(back.body.archived_at).toBeNull();
    expect(await listed()).toContain(fx.projectId);
    expect((await api().patch(`${base}/surfaces/${fx.surfaceIds[0]}`).set(consultant()).send({ version: 1, area_m2: 30 })).status).toBe(200);
  });
});

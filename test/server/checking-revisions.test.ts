// Issuing revisions on the built app and the real PostgreSQL: refused while a row is not accepted,
// on the free plan, by non-checkers and when nothing changed; an issued revision cannot be changed
// through any route (checking-freeze.test.ts: nor by SQL); two revisions compared on a known pair.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startAppWithSessions, type BuiltApp } from "../support/app-with-sessions";
import { clearPlan, grantPaidPlan } from "../support/billing";
import { acceptAll, auditOf } from "../support/checking";
import { closeTestDb, testDb } from "../support/db";
import { binaryBody, pdfPages } from "../support/pdf-text";
import { makeProject, SURFACE_VALUES, type FixtureProject } from "../support/schedule-fixtures";

const EMAILS = ["consultant@demo.filmsheet.test", "checker@demo.filmsheet.test", "viewer@demo.filmsheet.test", "admin@demo.filmsheet.test", "admin@other.filmsheet.test"] as const;
let app: BuiltApp;
let as: Record<(typeof EMAILS)[number], Record<string, string>>;
let checkerId: number;
let firmId: string;

beforeAll(async () => {
  ({ app, as } = await startAppWithSessions(EMAILS));
  checkerId = (await testDb()("users").where({ email: "checker@demo.filmsheet.test" }).first("id")).id;
  firmId = (await testDb()("firms").where({ slug: "tarnbrook-sill" }).first("id")).id;
  await grantPaidPlan(firmId);
});

afterAll(async () => {
  await clearPlan(firmId);
  await app?.close();
  await closeTestDb();
});

const checker = () => as["checker@demo.filmsheet.test"];
const consultant = () => as["consultant@demo.filmsheet.test"];
const issue = (fx: FixtureProject, who = checker(), note?: string) => request(app.server).post(`/api/projects/${fx.projectId}/revisions`).set(who).send(note === undefined ? {} : { note });
const stored = async (projectId: string, letter: string) => testDb()("revisions").where({ project_id: projectId, letter }).first();

describe("issuing", () => {
  test("refused while any row is unchecked or queried, naming how many; nothing is saved", async () => {
    const fx = await makeProject("tarnbrook-sill");
    await acceptAll(fx.projectId, checkerId);
    await testDb()("row_checks").where({ row_id: fx.surfaceIds[1] }).update({ state: "queried" });
    await testDb()("row_checks").where({ row_id: fx.ductRunIds[0] }).delete();
    const res = await issue(fx);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toBe("Every row must be accepted before a revision is issued: 1 unchecked and 1 queried");
    expect(await testDb()("revisions").where({ project_id: fx.projectId })).toEqual([]);
    expect(await auditOf(fx.projectId, { entity: "revision" })).toEqual([]);
  });

  test.each([
    ["consultant@demo.filmsheet.test", 403],
    ["viewer@demo.filmsheet.test", 403],
    ["admin@demo.filmsheet.test", 403],
    ["admin@other.filmsheet.test", 403],
  ] as const)("%s may not issue (%i)", async (email, status) => {
    const fx = await makeProject("tarnbrook-sill");
    await acceptAll(fx.projectId, checkerId);
    expect((await issue(fx, as[email])).status).toBe(status);
  });

  test("a free-plan firm cannot issue: 402 naming the upgrade path", async () => {
    const fx = await makeProject("tarnbrook-sill");
    await acceptAll(fx.projectId, checkerId);
    await clearPlan(firmId);
    try {
      const res = await issue(fx);
      expect(res.status).toBe(402);
      expect(res.body.error).toMatchObject({ code: "plan_limit", details: { limit: "revisions", upgradePath: "/firm/billing" } });
    } finally {
      await grantPaidPlan(firmId);
    }
    expect(await testDb()("revisions").where({ project_id: fx.projectId })).toEqual([]);
  });

  test("with every row accepted a checker issues A, then B after a change; nothing new → refused", async () => {
    const fx = await makeProject("tarnbrook-sill");
    await acceptAll(fx.projectId, checkerId);
    const a = await issue(fx, checker(), "For tender");
    expect(a.status, a.text).toBe(201);
    expect(a.body).toMatchObject({ letter: "A", sequence: 1, issued_by_name: "Solveig Prynne", note: "For tender", rows: 5 });
    const again = await issue(fx);
    expect(again.status).toBe(409);
    expect(again.body.error.message).toBe("Nothing in the schedule has changed since revision A");

    const edit = await request(app.server).patch(`/api/projects/${fx.projectId}/surfaces/${fx.surfaceIds[0]}`).set(consultant()).send({ version: 1, area_m2: 20 });
    expect(edit.status).toBe(200);
    expect((await issue(fx)).status).toBe(409); // the edited row is unchecked again
    await acceptAll(fx.projectId, checkerId);
    const b = await issue(fx);
    expect(b.status, b.text).toBe(201);
    expect(b.body.letter).toBe("B");

    const list = await request(app.server).get(`/api/projects/${fx.projectId}/revisions`).set(as["viewer@demo.filmsheet.test"]);
    expect(list.status).toBe(200);
    expect(list.body.revisions.map((r: { letter: string }) => r.letter)).toEqual(["B", "A"]);
    expect(await auditOf(fx.projectId, { entity: "revision" })).toEqual([
      expect.objectContaining({ action: "issue", actor_name: "Solveig Prynne", after: expect.objectContaining({ letter: "A", rows: 5 }) }),
      expect.objectContaining({ action: "issue", after: expect.objectContaining({ letter: "B" }) }),
    ]);
  });

  test("the snapshot holds the inputs, the results of every design case, the check states and the comments", async () => {
    const fx = await makeProject("tarnbrook-sill");
    await testDb()("row_comments").insert({ firm_id: fx.firmId, project_id: fx.projectId, sheet: "surfaces", row_id: fx.surfaceIds[0], author_name: "Solveig Prynne", kind: "note", body: "Checked against the façade drawings" });
    await acceptAll(fx.projectId, checkerId);
    expect((await issue(fx)).status).toBe(201);
    const res = await request(app.server).get(`/api/projects/${fx.projectId}/revisions/A`).set(as["viewer@demo.filmsheet.test"]);
    expect(res.status).toBe(200);
    const s = res.body.snapshot;
    expect(s.format).toBe(1);
    expect(s.surfaces.map((r: { id: string }) => r.id)).toEqual(fx.surfaceIds);
    expect(s.duct_runs).toHaveLength(2);
    expect(s.buildups.find((b: { id: string }) => b.id === fx.buildupIds.layered).layers).toHaveLength(2);
    expect(s.results.map((r: { design_case_id: string }) => r.design_case_id).sort()).toEqual([fx.caseIds.heating, fx.caseIds.cooling].sort());
    for (const r of s.results) {
      expect(r.surfaces).toHaveLength(3);
      expect(r.surfaces.every((x: { result: { ok: boolean } }) => x.result.ok)).toBe(true);
      expect(r.zones).toHaveLength(2);
    }
    expect(s.checks).toHaveLength(5);
    expect(s.checks.every((c: { state: string; checked_by_name: string }) => c.state === "accepted" && c.checked_by_name === "Solveig Prynne")).toBe(true);
    expect(s.comments).toEqual([expect.objectContaining({ row_id: fx.surfaceIds[0], body: "Checked against the façade drawings" })]);
  });
});

describe("an issued revision never changes", () => {
  let fx: FixtureProject;
  let before: Record<string, unknown>;

  beforeAll(async () => {
    fx = await makeProject("tarnbrook-sill");
    await acceptAll(fx.projectId, checkerId);
    expect((await issue(fx)).status).toBe(201);
    before = await stored(fx.projectId, "A");
  });

  test.each(["patch", "put", "delete", "post"] as const)("%s on the revision's address is not allowed (405)", async (method) => {
    const res = await request(app.server)[method](`/api/projects/${fx.projectId}/revisions/A`).set(checker()).send({ note: "changed", snapshot: {} });
    expect(res.status).toBe(405);
    expect(await stored(fx.projectId, "A")).toEqual(before);
  });

  test("editing, deleting and adding rows after issue changes the draft, never the revision", async () => {
    const base = `/api/projects/${fx.projectId}`;
    expect((await request(app.server).patch(`${base}/surfaces/${fx.surfaceIds[0]}`).set(consultant()).send({ version: 1, area_m2: 30 })).status).toBe(200);
    expect((await request(app.server).delete(`${base}/duct-runs/${fx.ductRunIds[1]}?version=1`).set(consultant())).status).toBe(200);
    expect((await request(app.server).post(`${base}/surfaces`).set(consultant()).send({ ...SURFACE_VALUES, label: "New bay", zone_id: fx.zoneIds[0], buildup_id: fx.buildupIds.direct })).status).toBe(201);
    expect((await request(app.server).patch(`${base}`).set(consultant()).send({ version: 1, altitude_m: 500 })).status).toBe(200);
    expect(await stored(fx.projectId, "A")).toEqual(before);
  });

  test("a project with an issued revision is never deleted: consultants 403, admins 409 naming the archive; the revision stays", async () => {
    const other = await makeProject("tarnbrook-sill");
    await acceptAll(other.projectId, checkerId);
    expect((await issue(other)).status).toBe(201);
    expect((await request(app.server).delete(`/api/projects/${other.projectId}?version=1`).set(consultant())).status).toBe(403);
    const res = await request(app.server).delete(`/api/projects/${other.projectId}?version=1`).set(as["admin@demo.filmsheet.test"]);
    expect(res.status, res.text).toBe(409);
    expect(res.body.error.message).toContain("archive it instead");
    expect(await testDb()("revisions").where({ project_id: other.projectId })).toHaveLength(1);
    expect(await testDb()("projects").where({ id: other.projectId }).first("id")).toBeDefined();
  });
});

describe("comparing two revisions", () => {
  test("a known pair: one surface changed, one duct run removed, one surface added, and each zone total's change", async () => {
    const fx = await makeProject("tarnbrook-sill");
    await acceptAll(fx.projectId, checkerId);
    expect((await issue(fx)).status).toBe(201);
    const base = `/api/projects/${fx.projectId}`;
    expect((await request(app.server).patch(`${base}/surfaces/${fx.surfaceIds[1]}`).set(consultant()).send({ version: 1, area_m2: 25 })).status).toBe(200);
    expect((await request(app.server).delete(`${base}/duct-runs/${fx.ductRunIds[1]}?version=1`).set(consultant())).status).toBe(200);
    const added = await request(app.server).post(`${base}/surfaces`).set(consultant()).send({ ...SURFACE_VALUES, label: "North wall", azimuth_deg: 0, zone_id: fx.zoneIds[1], buildup_id: fx.buildupIds.layered });
    expect(added.status).toBe(201);
    await acceptAll(fx.projectId, checkerId);
    expect((await issue(fx)).status).toBe(201);

    const res = await request(app.server).get(`${base}/revisions/compare?from=A&to=B`).set(as["viewer@demo.filmsheet.test"]);
    expect(res.status, res.text).toBe(200);
    const c = res.body;
    expect(c.from).toBe("A");
    expect(c.to).toBe("B");
    expect(c.rows.added).toEqual([{ sheet: "surfaces", id: added.body.id, label: "North wall" }]);
    expect(c.rows.removed).toEqual([{ sheet: "duct_runs", id: fx.ductRunIds[1], label: "Void extract" }]);
    expect(c.rows.changed).toHaveLength(1);
    expect(c.rows.changed[0]).toMatchObject({ sheet: "surfaces", id: fx.surfaceIds[1], label: "West wall", fields: [{ field: "area_m2", before: 12.5, after: 25 }] });
    expect(c.rows.changed[0].flows).toHaveLength(2);
    expect(c.settings).toEqual([]);

    // Expected zone changes from the frozen results themselves. A zone's net loss (loss − gain)
    // counts a surface's Q (positive = out of the zone) and a duct run's −Q (positive = into the air).
    const a = (await stored(fx.projectId, "A")).snapshot;
    const b = (await stored(fx.projectId, "B")).snapshot;
    const q = (s: typeof a, caseId: string, sheet: string, id: string) => s.results.find((r: { design_case_id: string }) => r.design_case_id === caseId)[sheet].find((r: { row_id: string }) => r.row_id === id).result.Q_W as number;
    expect(c.zones).toHaveLength(4); // 2 design cases × 2 zones
    for (const z of c.zones) {
      const dc = z.design_case_id;
      // Hall: the west wall's area doubled. Office: the new north wall in, the void extract out.
      const netChange = z.zone_id === fx.zoneIds[0] ? q(b, dc, "surfaces", fx.surfaceIds[1]!) - q(a, dc, "surfaces", fx.surfaceIds[1]!) : q(b, dc, "surfaces", added.body.id) + q(a, dc, "duct_runs", fx.ductRunIds[1]!);
      expect(netChange).not.toBe(0);
      expect(z.loss_delta_W).toBeCloseTo(z.after.loss_W - z.before.loss_W, 9);
      expect(z.gain_delta_W).toBeCloseTo(z.after.gain_W - z.before.gain_W, 9);
      expect(z.loss_delta_W - z.gain_delta_W).toBeCloseTo(netChange, 6);
    }
  });

  test("naming a revision that does not exist is 404; the same one twice is 422", async () => {
    const fx = await makeProject("tarnbrook-sill");
    const base = `/api/projects/${fx.projectId}/revisions/compare`;
    expect((await request(app.server).get(`${base}?from=A&to=B`).set(checker())).status).toBe(404);
    const bad = await request(app.server).get(`${base}?from=a&to=B`).set(checker());
    expect(bad.status).toBe(422);
    expect(bad.body.error.details[0].field).toBe("query.from");
  });
});

describe("an issued revision's report", () => {
  const report = (fx: FixtureProject, who: Record<string, string>) => request(app.server).get(`/api/projects/${fx.projectId}/revisions/A/report`).set(who).buffer(true).parse(binaryBody);

  test("a viewer downloads it: issued, revision A, its checker, every row's label; clean on the paid plan", async () => {
    const fx = await makeProject("tarnbrook-sill");
    await acceptAll(fx.projectId, checkerId);
    expect((await issue(fx)).status).toBe(201);
    const res = await report(fx, as["viewer@demo.filmsheet.test"]);
    expect(res.status, String(res.body)).toBe(200);
    expect(res.headers["content-disposition"]).toMatch(/FX-.*-revision-A-report\.pdf/);
    const pages = await pdfPages(new Uint8Array(res.body as Buffer));
    expect(pages[0]).toContain("Revision");
    expect(pages[0]).toMatch(/\bA\b/);
    expect(pages[0]).toContain("Solveig Prynne");
    const text = pages.join(" ");
    for (const label of ["South wall", "West wall", "Roof", "Roof supply", "Void extract"]) expect(text).toContain(label);
    expect(text).not.toContain("NOT FOR ISSUE");
  });

  test("reads from the frozen snapshot: editing the draft afterwards does not change it", async () => {
    const fx = await makeProject("tarnbrook-sill");
    await acceptAll(fx.projectId, checkerId);
    expect((await issue(fx)).status).toBe(201);
    const before = (await pdfPages(new Uint8Array((await report(fx, checker())).body as Buffer))).slice(1).join(" ");
    expect((await request(app.server).patch(`/api/projects/${fx.projectId}/surfaces/${fx.surfaceIds[0]}`).set(consultant()).send({ version: 1, label: "South wall (moved)", area_m2: 40 })).status).toBe(200);
    const after = (await pdfPages(new Uint8Array((await report(fx, checker())).body as Buffer))).slice(1).join(" ");
    expect(after).toBe(before);
    expect(after).not.toContain("South wall (moved)");
  });

  test("is stored as first built: the same bytes every time, even after the firm's plan lapses", async () => {
    const fx = await makeProject("tarnbrook-sill");
    await acceptAll(fx.projectId, checkerId);
    expect((await issue(fx)).status).toBe(201);
    const first = (await report(fx, checker())).body as Buffer;
    await clearPlan(firmId);
    try {
      const again = (await report(fx, as["viewer@demo.filmsheet.test"])).body as Buffer;
      expect(again.equals(first)).toBe(true);
      expect((await pdfPages(new Uint8Array(again))).join(" ")).not.toContain("NOT FOR ISSUE");
    } finally {
      await grantPaidPlan(firmId);
    }
  });
});

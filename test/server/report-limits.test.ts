// What one firm can make the report builder do: one queued or running draft per project (asking
// again returns it), no report beyond REPORT_LIMITS.rowCases row-cases (413 before anything is
// queued), the in-request build for small projects only (413 pointing at the job route), and no
// more than the free plan's design cases.
import { randomUUID } from "node:crypto";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { FREE_PLAN } from "@/schemas/billing";
import { REPORT_LIMITS } from "@/schemas/reports";
import { runReportBuild } from "@/server/reports/run-report-build";
import { startAppWithSessions, type BuiltApp } from "../support/app-with-sessions";
import { newFirmAdmin } from "../support/billing";
import { closeTestDb, testDb } from "../support/db";
import { makeProject, type FixtureProject } from "../support/schedule-fixtures";

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

const askDraft = (projectId: string) => request(app.server).post(`/api/projects/${projectId}/reports`).set(consultant).send({ kind: "draft" });

/** Adds `n` copies of the fixture's first surface (straight into the database, as an import would). */
async function addSurfaces(fx: FixtureProject, n: number): Promise<void> {
  const first = await testDb()("surfaces").where({ id: fx.surfaceIds[0] }).first();
  const rows = Array.from({ length: n }, (_, i) => ({ ...first, id: randomUUID(), label: `Bay ${i}`, position: 100 + i, version: 1 }));
  for (let i = 0; i < rows.length; i += 1000) await testDb()("surfaces").insert(rows.slice(i, i + 1000));
}

describe("one draft at a time per project", () => {
  test("while a draft is queued or running, asking again returns it (200) and queues nothing", async () => {
    const fx = await makeProject("tarnbrook-sill");
    const [running] = await testDb()("report_builds")
      .insert({ firm_id: fx.firmId, project_id: fx.projectId, kind: "draft", status: "running", progress: 0.4, stage: "Writing", watermark: true, requested_by_name: "Test" })
      .returning("id");
    const again = await askDraft(fx.projectId);
    expect(again.status, again.text).toBe(200);
    expect(again.body).toMatchObject({ id: running.id, status: "running", progress: 0.4 });
    expect(await testDb()("report_builds").where({ project_id: fx.projectId })).toHaveLength(1);
  });

  test("two requests at once make one build", async () => {
    const fx = await makeProject("tarnbrook-sill");
    const [a, b] = await Promise.all([askDraft(fx.projectId), askDraft(fx.projectId)]);
    expect([a.status, b.status].sort()).toEqual([200, 202]);
    expect(a.body.id).toBe(b.body.id);
    expect(await testDb()("report_builds").where({ project_id: fx.projectId })).toHaveLength(1);
  });

  test("a draft gone quiet (its server stopped) no longer blocks a new one", async () => {
    const fx = await makeProject("tarnbrook-sill");
    const [quiet] = await testDb()("report_builds")
      .insert({ firm_id: fx.firmId, project_id: fx.projectId, kind: "draft", status: "running", watermark: true, requested_by_name: "Test", updated_at: new Date(Date.now() - 20 * 60_000) })
      .returning("id");
    const res = await askDraft(fx.projectId);
    expect(res.status, res.text).toBe(202);
    expect(res.body.id).not.toBe(quiet.id);
    expect((await testDb()("report_builds").where({ id: quiet.id }).first("status")).status).toBe("failed");
  });
});

describe("the size of a report", () => {
  let big: FixtureProject;
  beforeAll(async () => {
    big = await makeProject("tarnbrook-sill");
    // 5 + 4,998 rows × 2 design cases = 10,006 row-cases, just over the limit.
    await addSurfaces(big, REPORT_LIMITS.rowCases / 2 - 2);
  });

  test(`over ${REPORT_LIMITS.rowCases} row-cases a draft is refused (413) naming both counts, and nothing is queued`, async () => {
    const res = await askDraft(big.projectId);
    expect(res.status, res.text).toBe(413);
    expect(res.body.error.code).toBe("payload_too_large");
    expect(res.body.error.message).toContain(`${REPORT_LIMITS.rowCases / 2 + 3} rows × 2 design cases`);
    expect(res.body.error.message).toContain(`at most ${REPORT_LIMITS.rowCases}`);
    expect(await testDb()("report_builds").where({ project_id: big.projectId })).toEqual([]);
  });

  test("a draft whose schedule grew past the limit after it was asked for fails at build time, saying why", async () => {
    const [b] = await testDb()("report_builds").insert({ firm_id: big.firmId, project_id: big.projectId, kind: "draft", watermark: true, requested_by_name: "Test" }).returning("id");
    await runReportBuild(b.id);
    const row = await testDb()("report_builds").where({ id: b.id }).first("status", "error", "pdf");
    expect(row).toMatchObject({ status: "failed", pdf: null });
    expect(row.error).toContain(`at most ${REPORT_LIMITS.rowCases} are built`);
  });

  test(`the in-request build takes up to ${REPORT_LIMITS.inRequestRowCases} row-cases; above, 413 points at the job route`, async () => {
    const res = await request(app.server).get(`/api/projects/${big.projectId}/report`).set(consultant);
    expect(res.status).toBe(413);
    expect(res.body.error.message).toContain(`POST /api/projects/${big.projectId}/reports`);
    const small = await makeProject("tarnbrook-sill");
    const ok = await request(app.server).get(`/api/projects/${small.projectId}/report`).set(consultant).buffer(true);
    expect(ok.status).toBe(200);
    expect(ok.headers["content-type"]).toBe("application/pdf");
  });
});

describe("design cases on the free plan", () => {
  test(`a free firm's project holds ${FREE_PLAN.designCasesPerProject} design cases; the next is refused (402) naming the plan`, async () => {
    const { port } = app.server.address() as { port: number };
    const founder = await newFirmAdmin(app.server, `http://127.0.0.1:${port}`);
    const project = await request(app.server).post("/api/projects").set(founder.headers).send({ name: "Case count hall", reference: "CC-1" });
    expect(project.status, project.text).toBe(201);
    const addCase = (i: number) =>
      request(app.server)
        .post(`/api/projects/${project.body.id}/design-cases`)
        .set(founder.headers)
        .send({ name: `Case ${i}`, kind: "heating", T_outdoor_C: -2 - i, RH_outdoor_pct: 80, V_met_m_s: 5, wind_from_deg: 200, solar_W_m2: {} });
    for (let i = 1; i <= FREE_PLAN.designCasesPerProject; i++) expect((await addCase(i)).status).toBe(201);
    const over = await addCase(FREE_PLAN.designCasesPerProject + 1);
    expect(over.status, over.text).toBe(402);
    expect(over.body.error.message).toContain(`The free plan holds ${FREE_PLAN.designCasesPerProject} design cases per project`);
    expect(over.body.error.details).toMatchObject({ limit: "designCases", allowed: FREE_PLAN.designCasesPerProject, requested: FREE_PLAN.designCasesPerProject + 1 });
    expect(await testDb()("design_cases").where({ project_id: project.body.id })).toHaveLength(FREE_PLAN.designCasesPerProject);
  });
});


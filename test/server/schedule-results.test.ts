// GET /api/projects/:id/results against the engine itself: the server's answer must equal
// src/calc's scheduleResults run here on the rows exactly as stored (read back from PostgreSQL
// and mapped by hand in this file), for the demo project and a fixture, in every design case.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { scheduleResults, type Buildup, type DesignCase, type Schedule } from "@/calc/index";
import { startAppWithSessions, type BuiltApp } from "../support/app-with-sessions";
import { closeTestDb, testDb } from "../support/db";
import { makeProject, type FixtureProject } from "../support/schedule-fixtures";

let app: BuiltApp;
// A checker reads results (viewers see issued revisions only; see the access matrix).
let checker: Record<string, string>;
let fx: FixtureProject;

beforeAll(async () => {
  const started = await startAppWithSessions(["checker@demo.filmsheet.test"]);
  app = started.app;
  checker = started.as["checker@demo.filmsheet.test"];
  fx = await makeProject("tarnbrook-sill");
});
afterAll(async () => {
  await app?.close();
  await closeTestDb();
});

/** The engine's view of a stored project, built straight from the tables. */
async function storedSchedule(projectId: string): Promise<{ schedule: Schedule; cases: DesignCase[] }> {
  const db = testDb();
  const p = await db("projects").where({ id: projectId }).first();
  // The schedule's own order: position, then age (rows added at the same position keep theirs).
  const rows = (t: string) => db(t).where({ project_id: projectId }).orderBy(t === "surfaces" || t === "duct_runs" ? [{ column: "position" }, { column: "created_at" }] : [{ column: "name" }]);
  const layers = await db("buildup_layers").whereIn("buildup_id", db("buildups").where({ project_id: projectId }).select("id")).orderBy(["buildup_id", "position"]);
  const buildups: Buildup[] = (await rows("buildups")).map((b) => ({
    ...b,
    layers: layers.filter((l) => l.buildup_id === b.id).map((l) => ({ material: l.material, thickness_m: l.thickness_m, k_W_mK: l.k_W_mK })),
  }));
  return {
    schedule: {
      site: { altitude_m: p.altitude_m, terrain: p.terrain, wind_law: p.wind_law, method: p.default_method },
      zones: await rows("zones"),
      buildups,
      surfaces: await rows("surfaces"),
      ductRuns: await rows("duct_runs"),
    },
    cases: await rows("design_cases"),
  };
}

async function demoProjectId(): Promise<string> {
  return (await testDb()("projects").where({ reference: "TS-2417" }).first("id")).id;
}

describe("server results equal the engine's on the stored rows", () => {
  test.each([["the demo project"], ["a fixture project"]])("%s, every design case", async (which) => {
    const id = which === "the demo project" ? await demoProjectId() : fx.projectId;
    const { schedule, cases } = await storedSchedule(id);
    expect(cases.length).toBeGreaterThan(1);
    for (const dc of cases) {
      const res = await request(app.server).get(`/api/projects/${id}/results?case=${dc.id}`).set(checker);
      expect(res.status, res.text).toBe(200);
      // Expected: src/calc scheduleResults on the same inputs, through JSON as the API sends it.
      const expected = JSON.parse(JSON.stringify(scheduleResults(schedule, dc)));
      expect(res.body).toEqual({ case_name: dc.name, ...expected });
      expect(res.body.surfaces).toHaveLength(schedule.surfaces.length);
      expect(res.body.duct_runs).toHaveLength(schedule.ductRuns.length);
    }
  });

  test("a layered build-up reaches the engine as Σ t/k: U = 1/(R_si + R + 1/h_o) with R from the layers", async () => {
    const res = await request(app.server).get(`/api/projects/${fx.projectId}/results?case=${fx.caseIds.heating}`).set(checker);
    const wall = res.body.surfaces.find((s: { row_id: string }) => s.row_id === fx.surfaceIds[0]).result;
    // R by hand from the fixture's layers: 0.1/0.77 + 0.15/0.035 = 4.41558 m²K/W; R_si 0.13 (contract default).
    const R = 0.1 / 0.77 + 0.15 / 0.035;
    expect(wall.U_W_m2K).toBeCloseTo(1 / (0.13 + R + 1 / wall.h_o_W_m2K), 9);
    // Heat flows out in winter through a wall: Q = q·A with the fixture's 12.5 m².
    expect(wall.Q_W).toBeCloseTo(wall.q_W_m2 * 12.5, 9);
    expect(wall.Q_W).toBeGreaterThan(0);
  });

  test("an unknown design case is not found; a missing one is refused naming the parameter", async () => {
    const unknown = await request(app.server).get(`/api/projects/${fx.projectId}/results?case=00000000-0000-4000-8000-000000000000`).set(checker);
    expect(unknown.status).toBe(404);
    const missing = await request(app.server).get(`/api/projects/${fx.projectId}/results`).set(checker);
    expect(missing.status).toBe(422);
    expect(missing.body.error.details[0].field).toBe("query.case");
  });
});

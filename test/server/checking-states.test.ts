// The check states of a row on the built app and the real PostgreSQL: every move from every state
// by every kind of caller, the version rule, the last-editor rule, and rows returning to
// unchecked when they (or what they are computed from) change.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startAppWithSessions, type BuiltApp } from "../support/app-with-sessions";
import { auditOf, makeMember, stateOf } from "../support/checking";
import { closeTestDb, testDb } from "../support/db";
import { makeProject, type FixtureProject } from "../support/schedule-fixtures";
import { sessionCookie } from "../support/sessions";
import { bearer, makeToken } from "../support/tokens";

type Who = "anonymous" | "consultant" | "checker" | "viewer" | "admin" | "admin_token" | "checker_token" | "other_checker" | "dual";
type State = "unchecked" | "accepted" | "queried";
const PASSWORD = process.env.DEMO_PASSWORD || "filmsheet-demo";
let app: BuiltApp;
const as = {} as Record<Who, Record<string, string>>;
let dualId: number;

beforeAll(async () => {
  const started = await startAppWithSessions(["consultant@demo.filmsheet.test", "checker@demo.filmsheet.test", "viewer@demo.filmsheet.test", "admin@demo.filmsheet.test"] as const);
  app = started.app;
  const origin = started.as["checker@demo.filmsheet.test"].origin!;
  as.anonymous = { origin };
  as.consultant = started.as["consultant@demo.filmsheet.test"];
  as.checker = started.as["checker@demo.filmsheet.test"];
  as.viewer = started.as["viewer@demo.filmsheet.test"];
  as.admin = started.as["admin@demo.filmsheet.test"];
  as.admin_token = bearer(await makeToken("tarnbrook-sill", "admin"));
  as.checker_token = bearer(await makeToken("tarnbrook-sill", "checker"));
  const other = await makeMember("ostrander-mechanical", ["checker"], "Other firm checker");
  as.other_checker = { cookie: await sessionCookie(app.server, other.email, PASSWORD), origin };
  // Both consultant and checker: may check rows, except those they last edited.
  const dual = await makeMember("tarnbrook-sill", ["consultant", "checker"], "Dual role engineer");
  dualId = dual.id;
  as.dual = { cookie: await sessionCookie(app.server, dual.email, PASSWORD), origin };
});

afterAll(async () => {
  await app?.close();
  await closeTestDb();
});

const rowPath = (fx: FixtureProject, i = 0) => `/api/projects/${fx.projectId}/surfaces/${fx.surfaceIds[i]}`;
const version = async (table: string, id: string) => (await testDb()(table).where({ id }).first("version")).version as number;

/** A fresh project whose first surface is in `state` (checked by someone else, as a checker would). */
async function projectWithRowIn(state: State): Promise<FixtureProject> {
  const fx = await makeProject("tarnbrook-sill");
  if (state !== "unchecked") {
    const checker = await testDb()("users").where({ email: "checker@demo.filmsheet.test" }).first("id");
    await testDb()("row_checks").insert({ firm_id: fx.firmId, project_id: fx.projectId, sheet: "surfaces", row_id: fx.surfaceIds[0], state, checked_by: checker.id, checked_at: new Date(), checked_row_version: 1 });
  }
  return fx;
}

async function move(who: Who, fx: FixtureProject, body: Record<string, unknown>) {
  return request(app.server).post(`${rowPath(fx)}/check`).set(as[who]).send({ row_version: await version("surfaces", fx.surfaceIds[0]!), ...body });
}

// [from, caller, move, comment, status, state afterwards]
const CASES: [State, Who, "accept" | "query", string | undefined, number, State][] = [
  ["unchecked", "checker", "accept", undefined, 200, "accepted"],
  ["unchecked", "checker", "accept", "Film coefficient and sky model look right", 200, "accepted"],
  ["unchecked", "checker", "query", "Is 0.9 right for the cladding's emissivity?", 200, "queried"],
  ["queried", "checker", "accept", undefined, 200, "accepted"],
  ["accepted", "checker", "query", "The centroid height looks low for the second floor", 200, "queried"],
  ["accepted", "checker", "accept", undefined, 409, "accepted"],
  ["queried", "checker", "query", "And the length along the wind?", 409, "queried"],
  ["unchecked", "checker", "query", undefined, 422, "unchecked"],
  ["unchecked", "checker", "query", "   ", 422, "unchecked"],
  ["unchecked", "dual", "accept", undefined, 200, "accepted"],
  ...(["unchecked", "queried", "accepted"] as const).flatMap((from): [State, Who, "accept" | "query", string | undefined, number, State][] =>
    (["consultant", "viewer", "admin", "admin_token"] as const).flatMap((who) => [
      [from, who, "accept", undefined, 403, from],
      [from, who, "query", "Why?", 403, from],
    ]),
  ),
  // A checker's API token has the role, but a check is signed by a person.
  ["unchecked", "checker_token", "accept", undefined, 403, "unchecked"],
  ["unchecked", "other_checker", "accept", undefined, 404, "unchecked"],
  ["unchecked", "anonymous", "accept", undefined, 401, "unchecked"],
];

describe("every move from every state, by every caller", () => {
  test.each(CASES)("%s row, %s %ss (comment %j) → %i, then %s", async (from, who, m, comment, status, after) => {
    const fx = await projectWithRowIn(from);
    const res = await move(who, fx, { move: m, ...(comment === undefined ? {} : { comment }) });
    expect(res.status, res.text).toBe(status);
    expect(await stateOf(fx.projectId, "surfaces", fx.surfaceIds[0]!)).toBe(after);
    const audit = await auditOf(fx.projectId, { entity: "row_check" });
    if (status === 200) {
      expect(res.body).toMatchObject({ state: after, row_version: 1 });
      expect(audit).toEqual([expect.objectContaining({ action: m, before: expect.objectContaining({ state: from }), after: expect.objectContaining({ state: after }) })]);
      const thread = await testDb()("row_comments").where({ row_id: fx.surfaceIds[0] }).select("kind", "body");
      expect(thread).toEqual(comment === undefined ? [] : [{ kind: m, body: comment }]);
    } else {
      // Nothing recorded for a refused move.
      expect(audit).toEqual([]);
    }
    if (status === 422) expect(res.body.error.details).toContainEqual(expect.objectContaining({ field: "body.comment" }));
  });
});

describe("what a check rests on", () => {
  test("a check names the version it read: a row changed since then is refused with 409", async () => {
    const fx = await projectWithRowIn("unchecked");
    const edit = await request(app.server).patch(rowPath(fx)).set(as.consultant).send({ version: 1, area_m2: 13 });
    expect(edit.status, edit.text).toBe(200);
    const res = await request(app.server).post(`${rowPath(fx)}/check`).set(as.checker).send({ move: "accept", row_version: 1 });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/changed since you read it \(now version 2\)/);
    expect(await stateOf(fx.projectId, "surfaces", fx.surfaceIds[0]!)).toBe("unchecked");
  });

  test("whoever last edited a row cannot accept or query it; another checker can", async () => {
    const fx = await projectWithRowIn("unchecked");
    expect((await request(app.server).patch(rowPath(fx)).set(as.dual).send({ version: 1, area_m2: 11 })).status).toBe(200);
    const c = await testDb()("row_checks").where({ row_id: fx.surfaceIds[0] }).first("last_edited_by", "state");
    expect(c).toEqual({ last_edited_by: dualId, state: "unchecked" });
    for (const m of [{ move: "accept" }, { move: "query", comment: "Self-check" }]) {
      const res = await request(app.server).post(`${rowPath(fx)}/check`).set(as.dual).send({ ...m, row_version: 2 });
      expect(res.status, res.text).toBe(403);
      expect(res.body.error.message).toMatch(/You last edited this surface/);
    }
    expect((await request(app.server).post(`${rowPath(fx)}/check`).set(as.checker).send({ move: "accept", row_version: 2 })).status).toBe(200);
  });

  test("an edit through an API token makes the token's creator the last editor", async () => {
    const fx = await projectWithRowIn("unchecked");
    const secret = await makeToken("tarnbrook-sill", "consultant");
    await testDb()("api_tokens").where({ prefix: secret.slice(0, 10) }).update({ created_by: dualId });
    expect((await request(app.server).patch(rowPath(fx)).set(bearer(secret)).send({ version: 1, area_m2: 10 })).status).toBe(200);
    expect((await request(app.server).post(`${rowPath(fx)}/check`).set(as.dual).send({ move: "accept", row_version: 2 })).status).toBe(403);
  });
});

describe("a changed row returns to unchecked", () => {
  // [what changes, request, which surfaces and which duct runs drop (by index)]. The fixture puts
  // surfaces 0 and 1 (the layered build-up) and duct run 0 in zone 0; surface 2 and duct run 1 in zone 1.
  const CHANGES: [string, (fx: FixtureProject) => [string, string, object], number[], number[]][] = [
    ["the surface itself", (fx) => ["patch", rowPath(fx), { version: 1, area_m2: 14 }], [0], []],
    ["its build-up", (fx) => ["patch", `/api/projects/${fx.projectId}/buildups/${fx.buildupIds.layered}`, { version: 1, absorptance: 0.3 }], [0, 1], []],
    ["its zone", (fx) => ["patch", `/api/projects/${fx.projectId}/zones/${fx.zoneIds[0]}`, { version: 1, T_heating_C: 22 }], [0, 1], [0]],
    ["a design case", (fx) => ["patch", `/api/projects/${fx.projectId}/design-cases/${fx.caseIds.heating}`, { version: 1, V_met_m_s: 12 }], [0, 1, 2], [0, 1]],
    ["the site", (fx) => ["patch", `/api/projects/${fx.projectId}`, { version: 1, altitude_m: 300 }], [0, 1, 2], [0, 1]],
    // The v2 inputs are inputs like any other.
    ["what lies outside the surface", (fx) => ["patch", rowPath(fx), { version: 1, exposed_to: "ground" }], [0], []],
    ["whether a duct run is inside its zone", (fx) => ["patch", `/api/projects/${fx.projectId}/duct-runs/${fx.ductRunIds[0]}`, { version: 1, in_served_zone: true }], [], [0]],
    ["a duct run's jacket absorptance", (fx) => ["patch", `/api/projects/${fx.projectId}/duct-runs/${fx.ductRunIds[1]}`, { version: 1, jacket_absorptance: 0.3 }], [], [1]],
    ["a design case's cloud cover", (fx) => ["patch", `/api/projects/${fx.projectId}/design-cases/${fx.caseIds.cooling}`, { version: 1, cloud_cover: 0.8 }], [0, 1, 2], [0, 1]],
  ];

  test.each(CHANGES)("changing %s resets the rows it feeds, with an audit row saying why", async (_what, req, surfaces, ducts) => {
    const fx = await makeProject("tarnbrook-sill");
    const checker = await testDb()("users").where({ email: "checker@demo.filmsheet.test" }).first("id");
    for (const [sheet, ids] of [["surfaces", fx.surfaceIds], ["duct_runs", fx.ductRunIds]] as const) {
      await testDb()("row_checks").insert(ids.map((row_id) => ({ firm_id: fx.firmId, project_id: fx.projectId, sheet, row_id, state: "accepted", checked_by: checker.id, checked_at: new Date(), checked_row_version: 1 })));
    }
    const [method, path, body] = req(fx);
    const res = await request(app.server)[method as "patch"](path).set(as.consultant).send(body);
    expect(res.status, res.text).toBe(200);
    for (const [i, id] of fx.surfaceIds.entries()) expect(await stateOf(fx.projectId, "surfaces", id), `surface ${i}`).toBe(surfaces.includes(i) ? "unchecked" : "accepted");
    for (const [i, id] of fx.ductRunIds.entries()) expect(await stateOf(fx.projectId, "duct_runs", id), `duct run ${i}`).toBe(ducts.includes(i) ? "unchecked" : "accepted");
    const resets = await auditOf(fx.projectId, { entity: "row_check", action: "reset" });
    expect(resets).toHaveLength(surfaces.length + ducts.length);
    expect(resets[0]!.before).toMatchObject({ state: "accepted" });
  });

  test("renaming the project or saving a row unchanged keeps every check", async () => {
    const fx = await makeProject("tarnbrook-sill");
    const checker = await testDb()("users").where({ email: "checker@demo.filmsheet.test" }).first("id");
    await testDb()("row_checks").insert({ firm_id: fx.firmId, project_id: fx.projectId, sheet: "surfaces", row_id: fx.surfaceIds[0], state: "accepted", checked_by: checker.id, checked_at: new Date(), checked_row_version: 1 });
    expect((await request(app.server).patch(`/api/projects/${fx.projectId}`).set(as.consultant).send({ version: 1, name: "Fixture pavilion (renamed)" })).status).toBe(200);
    expect((await request(app.server).patch(rowPath(fx)).set(as.consultant).send({ version: 1, area_m2: 12.5 })).status).toBe(200);
    expect(await stateOf(fx.projectId, "surfaces", fx.surfaceIds[0]!)).toBe("accepted");
  });

  test("a deleted row takes its check with it; its history stays in the audit trail", async () => {
    const fx = await projectWithRowIn("accepted");
    const res = await request(app.server).delete(`${rowPath(fx)}?version=1`).set(as.consultant);
    expect(res.status, res.text).toBe(200);
    expect(await testDb()("row_checks").where({ row_id: fx.surfaceIds[0] }).first()).toBeUndefined();
    expect(await auditOf(fx.projectId, { entity_id: fx.surfaceIds[0] })).toEqual([expect.objectContaining({ entity: "surfaces", action: "delete", after: null, before: expect.objectContaining({ label: "South wall", version: 1 }) })]);
  });
});

describe("accepting the rows listed, all or nothing", () => {
  const all = (fx: FixtureProject, versions: Record<string, number> = {}) => [
    ...fx.surfaceIds.map((id) => ({ sheet: "surfaces", id, row_version: versions[id] ?? 1 })),
    ...fx.ductRunIds.map((id) => ({ sheet: "duct_runs", id, row_version: versions[id] ?? 1 })),
  ];

  test("a checker accepts every row listed at the versions read, each with its audit row", async () => {
    const fx = await projectWithRowIn("queried");
    const res = await request(app.server).post(`/api/projects/${fx.projectId}/checks`).set(as.checker).send({ rows: all(fx), filter: "All rows", confirmed_count: 5 });
    expect(res.status, res.text).toBe(200);
    expect(res.body).toEqual({ accepted: 5 });
    for (const id of fx.surfaceIds) expect(await stateOf(fx.projectId, "surfaces", id)).toBe("accepted");
    expect((await auditOf(fx.projectId, { entity: "row_check", action: "accept" })).length).toBe(5);
    const board = await request(app.server).get(`/api/projects/${fx.projectId}/checks`).set(as.consultant);
    expect(board.body.counts).toEqual({ rows: 5, unchecked: 0, accepted: 5, queried: 0, changed: 0, warnings: expect.any(Number) });
    expect(board.body.next_unchecked).toBeNull();
  });

  test.each([
    ["one row was changed since it was read", async (fx: FixtureProject) => void (await request(app.server).patch(rowPath(fx, 1)).set(as.consultant).send({ version: 1, area_m2: 3 })), "changed since you read it"],
    ["one row was last edited by this checker", async (fx: FixtureProject) => void (await testDb()("row_checks").insert({ firm_id: fx.firmId, project_id: fx.projectId, sheet: "surfaces", row_id: fx.surfaceIds[2], last_edited_by: dualId })), "You last edited this surface"],
    ["one row is already accepted", async (fx: FixtureProject) => void (await testDb()("row_checks").insert({ firm_id: fx.firmId, project_id: fx.projectId, sheet: "duct_runs", row_id: fx.ductRunIds[0], state: "accepted" })), "already accepted"],
  ])("refused when %s: 409 naming it, and no row is accepted", async (_what, arrange, message) => {
    const fx = await makeProject("tarnbrook-sill");
    await arrange(fx);
    const res = await request(app.server).post(`/api/projects/${fx.projectId}/checks`).set(as.dual).send({ rows: all(fx), filter: "All rows", confirmed_count: 5 });
    expect(res.status, res.text).toBe(409);
    expect(res.body.error.message).toBe("1 of 5 rows cannot be accepted; none was");
    expect(res.body.error.details).toEqual([expect.objectContaining({ message: expect.stringContaining(message) })]);
    expect(await auditOf(fx.projectId, { entity: "row_check", action: "accept" })).toEqual([]);
    expect(await testDb()("row_checks").where({ project_id: fx.projectId, state: "accepted" }).count({ n: "*" }).then((r) => Number(r[0]!.n))).toBe(_what === "one row is already accepted" ? 1 : 0);
  });

  test("a bad list is refused naming the field", async () => {
    const fx = await makeProject("tarnbrook-sill");
    const res = await request(app.server).post(`/api/projects/${fx.projectId}/checks`).set(as.checker).send({ rows: [{ sheet: "walls", id: "x", row_version: 0 }], filter: "All rows", confirmed_count: 1 });
    expect(res.status).toBe(422);
    expect(res.body.error.details.map((d: { field: string }) => d.field).sort()).toEqual(["body.rows.0.id", "body.rows.0.row_version", "body.rows.0.sheet"]);
  });
});

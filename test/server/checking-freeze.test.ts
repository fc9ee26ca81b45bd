// What the database itself guarantees, whoever connects: an issued revision is never updated,
// deleted or truncated (it goes only with its project), the audit trail is append-only, and audit
// rows written in a transaction that fails are rolled back with it.
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { db } from "@/server/db/knex";
import { createProject } from "@/server/services/create-project";
import { recordAudit } from "@/server/services/record-audit";
import { clearPlan, grantPaidPlan } from "../support/billing";
import { actorFor, auditOf } from "../support/checking";
import { closeTestDb, testDb } from "../support/db";

let firmId: string;
let serial = 0;

async function projectWithRevision(): Promise<string> {
  const [p] = await testDb()("projects").insert({ firm_id: firmId, name: "Freeze test hall", reference: `FZ-${process.pid}-${++serial}` }).returning("id");
  await testDb()("revisions").insert({ firm_id: firmId, project_id: p.id, sequence: 1, letter: "A", issued_by_name: "Solveig Prynne", note: "For tender", snapshot: JSON.stringify({ format: 1, checks: [] }) });
  return p.id;
}
const revisionOf = (projectId: string) => testDb()("revisions").where({ project_id: projectId }).first();

beforeAll(async () => {
  firmId = (await testDb()("firms").where({ slug: "tarnbrook-sill" }).first("id")).id;
});
afterAll(async () => {
  await db().destroy();
  await closeTestDb();
});

describe("an issued revision is frozen in the database", () => {
  test.each([
    ["UPDATE of the note", "UPDATE revisions SET note = 'edited' WHERE project_id = ?"],
    ["UPDATE of the snapshot", "UPDATE revisions SET snapshot = '{}'::jsonb WHERE project_id = ?"],
    ["UPDATE of the letter", "UPDATE revisions SET letter = 'Z' WHERE project_id = ?"],
    ["DELETE", "DELETE FROM revisions WHERE project_id = ?"],
  ])("a direct %s is refused and changes nothing", async (_what, sql) => {
    const projectId = await projectWithRevision();
    const before = await revisionOf(projectId);
    await expect(testDb().raw(sql, [projectId])).rejects.toThrow(/revisions rows are never changed: (UPDATE|DELETE) refused/);
    expect(await revisionOf(projectId)).toEqual(before);
  });

  test("TRUNCATE is refused", async () => {
    await projectWithRevision();
    // CASCADE: the revisions' stored reports and report builds refer to them.
    await expect(testDb().raw("TRUNCATE revisions CASCADE")).rejects.toThrow(/(revisions|revision_reports) rows are never changed: TRUNCATE refused/);
    expect(Number((await testDb()("revisions").count({ n: "*" }))[0]!.n)).toBeGreaterThan(0);
  });

  test("the project of an issued revision cannot be deleted, whoever asks; only its whole firm's deletion takes it", async () => {
    const projectId = await projectWithRevision();
    await expect(testDb()("projects").where({ id: projectId }).delete()).rejects.toThrow(/a project with issued revisions is never deleted/);
    expect(await revisionOf(projectId)).toBeDefined();

    const [firm] = await testDb()("firms").insert({ name: "Freeze test firm", slug: `freeze-${process.pid}-${++serial}` }).returning("id");
    const [p] = await testDb()("projects").insert({ firm_id: firm.id, name: "Freeze test hall", reference: `FZ-${process.pid}-${++serial}` }).returning("id");
    await testDb()("revisions").insert({ firm_id: firm.id, project_id: p.id, sequence: 1, letter: "A", issued_by_name: "Solveig Prynne", snapshot: JSON.stringify({ format: 1, checks: [] }) });
    await testDb()("firms").where({ id: firm.id }).delete();
    expect(await revisionOf(p.id)).toBeUndefined();
  });
});

describe("the audit trail", () => {
  test("is append-only: UPDATE, DELETE and TRUNCATE are refused", async () => {
    const actor = await actorFor("consultant@demo.filmsheet.test");
    const projectId = await projectWithRevision();
    await db().transaction((trx) => recordAudit(trx, actor, [{ projectId, entity: "project", entityId: projectId, action: "update", before: { name: "a" }, after: { name: "b" } }]));
    await expect(testDb().raw("UPDATE audit_log SET actor_name = 'someone else' WHERE project_id = ?", [projectId])).rejects.toThrow(/audit_log rows are never changed: UPDATE refused/);
    await expect(testDb().raw("DELETE FROM audit_log WHERE project_id = ?", [projectId])).rejects.toThrow(/audit_log rows are never changed: DELETE refused/);
    await expect(testDb().raw("TRUNCATE audit_log")).rejects.toThrow(/TRUNCATE refused/);
    expect(await auditOf(projectId)).toEqual([{ entity: "project", entity_id: projectId, action: "update", actor_name: "Idris Okonkwo-Hale", before: { name: "a" }, after: { name: "b" } }]);
  });

  test("outlives the project it describes", async () => {
    const actor = await actorFor("consultant@demo.filmsheet.test");
    const [{ id: projectId }] = await testDb()("projects").insert({ firm_id: firmId, name: "Freeze test hall", reference: `FZ-${process.pid}-${++serial}` }).returning("id");
    await db().transaction((trx) => recordAudit(trx, actor, [{ projectId, entity: "project", entityId: projectId, action: "delete", before: { name: "Freeze test hall" } }]));
    await testDb()("projects").where({ id: projectId }).delete();
    expect(await auditOf(projectId)).toHaveLength(1);
  });

  test("rows written in a transaction that then fails are rolled back with it", async () => {
    const actor = await actorFor("consultant@demo.filmsheet.test");
    const projectId = await projectWithRevision();
    await expect(
      db().transaction(async (trx) => {
        await trx("projects").where({ id: projectId }).update({ name: "Renamed in a failed change" });
        await recordAudit(trx, actor, [{ projectId, entity: "project", entityId: projectId, action: "update", before: { name: "Freeze test hall" }, after: { name: "Renamed in a failed change" } }]);
        expect(Number((await trx("audit_log").where({ project_id: projectId }).count({ n: "*" }))[0]!.n)).toBe(1);
        throw new Error("the change fails after its audit row was written");
      }),
    ).rejects.toThrow("the change fails");
    expect(await auditOf(projectId)).toEqual([]);
    expect((await testDb()("projects").where({ id: projectId }).first("name")).name).toBe("Freeze test hall");
  });

  test("creating a project records it, in the same transaction", async () => {
    const actor = await actorFor("consultant@demo.filmsheet.test");
    await grantPaidPlan(firmId);
    try {
      const project = await createProject(actor, { name: "Audited annexe", reference: `AU-${process.pid}` });
      expect(await auditOf(project.id)).toEqual([expect.objectContaining({ entity: "project", action: "create", actor_name: "Idris Okonkwo-Hale", before: null, after: expect.objectContaining({ name: "Audited annexe" }) })]);
    } finally {
      await clearPlan(firmId);
    }
  });
});

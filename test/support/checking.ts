// People and helpers for the checking tests: extra members with chosen roles (signed in with the
// demo password), actors for calling services directly, and the audit rows of a project.
import bcrypt from "bcryptjs";
import type { Knex } from "knex";
import type { Actor } from "../../src/server/auth/actor";
import { testDb } from "./db";

type Role = "admin" | "consultant" | "checker" | "viewer";
const PASSWORD = process.env.DEMO_PASSWORD || "filmsheet-demo";
let serial = 0;

/** A new member of a demo firm holding `roles`; signs in with the demo password. */
export async function makeMember(firmSlug: string, roles: Role[], name: string): Promise<{ id: number; email: string }> {
  const firm = await testDb()("firms").where({ slug: firmSlug }).first("id");
  const email = `${name.toLowerCase().replace(/[^a-z]+/g, "-")}-${process.pid}-${++serial}@checking.filmsheet.test`;
  // Cost 4: these accounts exist for one test run, and sign-in must stay quick.
  const [user] = await testDb()("users").insert({ email, name, password_hash: await bcrypt.hash(PASSWORD, 4) }).returning("id");
  await testDb()("memberships").insert(roles.map((role) => ({ firm_id: firm.id, user_id: user.id, role })));
  return { id: user.id, email };
}

/** The actor a signed-in member would be, for calling services directly. */
export async function actorFor(email: string, firmSlug = "tarnbrook-sill"): Promise<Actor> {
  const row = await testDb()("users as u").join("memberships as m", "m.user_id", "u.id").join("firms as f", "f.id", "m.firm_id").where({ "u.email": email, "f.slug": firmSlug }).select("u.id", "u.name", "u.email", "f.id as firm_id", "f.name as firm_name", "m.role");
  if (row.length === 0) throw new Error(`${email} is not a member of ${firmSlug}`);
  const firm = { id: row[0].firm_id, name: row[0].firm_name };
  return { via: "session", userId: row[0].id, name: row[0].name, email, firm, roles: row.map((r) => r.role), firms: [firm], tokenId: null };
}

/** Audit rows of a project, oldest first. */
export async function auditOf(projectId: string, where: Record<string, unknown> = {}): Promise<{ entity: string; entity_id: string; action: string; actor_name: string; before: any; after: any }[]> {
  return testDb()("audit_log").where({ project_id: projectId, ...where }).orderBy("id").select("entity", "entity_id", "action", "actor_name", "before", "after");
}

/** A row's stored check state ("unchecked" when it has none). */
export async function stateOf(projectId: string, sheet: "surfaces" | "duct_runs", rowId: string): Promise<string> {
  const c = await testDb()("row_checks").where({ project_id: projectId, sheet, row_id: rowId }).first("state");
  return c?.state ?? "unchecked";
}

/** Marks every row of a project accepted by `checkerId`, straight in the database (for issue tests). */
export async function acceptAll(projectId: string, checkerId: number): Promise<void> {
  const db = testDb();
  const { firm_id } = await db("projects").where({ id: projectId }).first("firm_id");
  for (const sheet of ["surfaces", "duct_runs"] as const) {
    const rows = await db(sheet).where({ project_id: projectId }).select("id", "version");
    if (rows.length === 0) continue;
    await db("row_checks")
      .insert(rows.map((r) => ({ firm_id, project_id: projectId, sheet, row_id: r.id, state: "accepted", checked_by: checkerId, checked_at: new Date(), checked_row_version: r.version })))
      .onConflict(["project_id", "sheet", "row_id"])
      .merge(["state", "checked_by", "checked_at", "checked_row_version"]);
  }
}

/**
 * E-mail jobs that earlier test files queued for a closed port are retried for hours; a test that
 * reads its own e-mail would wait behind them. They are marked failed for good, through the
 * queue's own admin function.
 */
export async function dropLeftoverEmailJobs(db: Knex): Promise<void> {
  const { rows } = await db.raw("SELECT to_regclass('graphile_worker._private_jobs') IS NOT NULL AS ready");
  if (!rows[0].ready) return; // no queue yet: nothing to drop
  await db.raw(
    `SELECT graphile_worker.permanently_fail_jobs(array_agg(j.id), 'left over by an earlier test file')
       FROM graphile_worker._private_jobs j JOIN graphile_worker._private_tasks t ON t.id = j.task_id
      WHERE t.identifier = 'send_email'
     HAVING count(*) > 0`,
  );
}

// Issued revisions (and their reports) outlive every attempt to delete their project: a project
// with an issued revision is archived instead — read-only and out of the main list, brought back
// by an admin. The database itself refuses to delete such a project; only the deletion of the
// whole firm (the cascade, recognised because the firm row is already gone) takes it.
import type { Knex } from "knex";

const KEEP_ISSUED = `
CREATE FUNCTION filmsheet_keep_issued_projects() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM revisions WHERE project_id = OLD.id) AND EXISTS (SELECT 1 FROM firms WHERE id = OLD.firm_id) THEN
    RAISE EXCEPTION 'a project with issued revisions is never deleted: DELETE refused'
      USING ERRCODE = 'integrity_constraint_violation', HINT = 'Archive the project instead';
  END IF;
  RETURN OLD;
END;
$$;
CREATE TRIGGER projects_keep_issued BEFORE DELETE ON projects
  FOR EACH ROW EXECUTE FUNCTION filmsheet_keep_issued_projects();`;

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("projects", (t) => {
    // Null: in use. Set: archived (read-only, listed apart), by whom.
    t.timestamp("archived_at", { useTz: true });
    t.integer("archived_by").references("users.id").onDelete("SET NULL");
  });
  await knex.raw(KEEP_ISSUED);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("DROP TRIGGER projects_keep_issued ON projects");
  await knex.raw("DROP FUNCTION filmsheet_keep_issued_projects()");
  await knex.schema.alterTable("projects", (t) => {
    t.dropColumn("archived_by");
    t.dropColumn("archived_at");
  });
}

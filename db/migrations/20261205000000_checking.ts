// Checking: each schedule row's check state and comment thread, issued revisions (frozen JSON
// snapshots), the audit trail of every change to a project's data, and per-project e-mail mutes.
//
// Rows of the schedule are referred to by (sheet, row_id) without a foreign key: a row's checks,
// comments and history outlive its deletion (the history must say it was deleted), and the
// schedule's own tables may be reorganised without touching these.
import type { Knex } from "knex";

const SHEETS = ["surfaces", "duct_runs"];
const STATES = ["unchecked", "accepted", "queried"];
const COMMENT_KINDS = ["query", "answer", "note", "accept"];

// An issued revision is a record of what was sent out: PostgreSQL itself refuses to change or
// delete it, whoever asks. It goes only with its project (or firm) — a cascade, which we detect
// because the parent row is already gone when the cascaded DELETE reaches the revision.
const FROZEN_FUNCTION = `
CREATE FUNCTION filmsheet_refuse_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'DELETE' AND TG_ARGV[0] = 'project' AND NOT EXISTS (SELECT 1 FROM projects WHERE id = OLD.project_id) THEN
    RETURN OLD;
  END IF;
  IF TG_OP = 'DELETE' AND NOT EXISTS (SELECT 1 FROM firms WHERE id = OLD.firm_id) THEN
    RETURN OLD;
  END IF;
  RAISE EXCEPTION '% rows are never changed: % refused', TG_TABLE_NAME, TG_OP
    USING ERRCODE = 'integrity_constraint_violation', HINT = TG_ARGV[1];
END;
$$;
CREATE FUNCTION filmsheet_refuse_truncate() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION '% rows are never changed: TRUNCATE refused', TG_TABLE_NAME USING ERRCODE = 'integrity_constraint_violation';
END;
$$;`;

function freeze(table: string, scope: "project" | "firm", hint: string): string {
  return `
CREATE TRIGGER ${table}_frozen BEFORE UPDATE OR DELETE ON ${table}
  FOR EACH ROW EXECUTE FUNCTION filmsheet_refuse_change('${scope}', '${hint}');
CREATE TRIGGER ${table}_no_truncate BEFORE TRUNCATE ON ${table}
  FOR EACH STATEMENT EXECUTE FUNCTION filmsheet_refuse_truncate();`;
}

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("row_checks", (t) => {
    t.bigIncrements("id");
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.enu("sheet", SHEETS, { useNative: false, enumName: "row_check_sheet" }).notNullable();
    t.uuid("row_id").notNullable();
    t.enu("state", STATES, { useNative: false, enumName: "row_check_state" }).notNullable().defaultTo("unchecked");
    // Who set the state (accepted or queried) and when; null while unchecked.
    t.integer("checked_by").references("users.id").onDelete("SET NULL");
    t.timestamp("checked_at", { useTz: true });
    // The row's version the check was made against.
    t.integer("checked_row_version");
    // Whoever last changed the row may not check it.
    t.integer("last_edited_by").references("users.id").onDelete("SET NULL");
    t.timestamp("last_edited_at", { useTz: true });
    t.integer("version").notNullable().defaultTo(1);
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["project_id", "sheet", "row_id"]);
    t.index(["project_id", "state"]);
  });

  await knex.schema.createTable("row_comments", (t) => {
    t.bigIncrements("id");
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.enu("sheet", SHEETS, { useNative: false, enumName: "row_comment_sheet" }).notNullable();
    t.uuid("row_id").notNullable();
    t.integer("author_id").references("users.id").onDelete("SET NULL");
    // Kept so the thread still names a member who has since been removed.
    t.string("author_name", 255).notNullable();
    t.enu("kind", COMMENT_KINDS, { useNative: false, enumName: "row_comment_kind" }).notNullable();
    t.text("body").notNullable();
    // The row's version the comment was written against.
    t.integer("row_version");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["project_id", "sheet", "row_id", "created_at"]);
  });

  await knex.schema.createTable("revisions", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    // 1, 2, 3 … shown as A, B, C … (then AA, AB …).
    t.integer("sequence").notNullable();
    t.string("letter", 8).notNullable();
    t.integer("issued_by").references("users.id").onDelete("SET NULL");
    t.string("issued_by_name", 255).notNullable();
    t.timestamp("issued_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text("note").notNullable().defaultTo("");
    // Inputs, results of every design case, check states and comments, as they stood when issued.
    t.jsonb("snapshot").notNullable();
    t.unique(["project_id", "sequence"]);
    t.unique(["project_id", "letter"]);
  });
  await knex.raw("ALTER TABLE revisions ADD CONSTRAINT revisions_sequence_positive CHECK (sequence >= 1)");

  // Who changed what and when. project_id has no foreign key on purpose: deleting a project must
  // not erase the record that it was deleted (a firm's deletion does take its history with it).
  await knex.schema.createTable("audit_log", (t) => {
    t.bigIncrements("id");
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    t.uuid("project_id");
    t.string("entity", 40).notNullable();
    t.text("entity_id").notNullable();
    t.string("action", 40).notNullable();
    t.integer("actor_user_id").references("users.id").onDelete("SET NULL");
    t.uuid("actor_token_id");
    t.string("actor_name", 255).notNullable();
    t.jsonb("before");
    t.jsonb("after");
    // now() is the transaction's start: the rows of one change share one time, in id order.
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["project_id", "id"]);
    t.index(["project_id", "entity_id", "id"]);
  });

  await knex.schema.createTable("notification_mutes", (t) => {
    t.integer("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["user_id", "project_id"]);
  });

  await knex.raw(FROZEN_FUNCTION);
  await knex.raw(freeze("revisions", "project", "Issue a new revision instead"));
  await knex.raw(freeze("audit_log", "firm", "The audit trail is append-only"));
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ["notification_mutes", "audit_log", "revisions", "row_comments", "row_checks"]) await knex.schema.dropTable(table);
  await knex.raw("DROP FUNCTION filmsheet_refuse_truncate()");
  await knex.raw("DROP FUNCTION filmsheet_refuse_change()");
}

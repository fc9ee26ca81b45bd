// Calculation reports built by the job queue: each request's progress (and a draft's PDF), and
// the PDF of every issued revision, stored with it and — like the revision — never changed.
import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  // One build of a report: a draft asked for on the project page, or an issued revision's
  // (queued in the transaction that issues it). The job writes its progress here as it goes.
  await knex.schema.createTable("report_builds", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.uuid("revision_id").references("revisions.id").onDelete("CASCADE");
    t.enu("kind", ["draft", "revision"], { useNative: false, enumName: "report_build_kind" }).notNullable();
    t.enu("status", ["queued", "running", "done", "failed"], { useNative: false, enumName: "report_build_status" }).notNullable().defaultTo("queued");
    t.double("progress").notNullable().defaultTo(0);
    t.string("stage", 200).notNullable().defaultTo("Waiting for the report worker");
    // Decided when the build is asked for: every draft, and any report of a free-plan firm.
    t.boolean("watermark").notNullable();
    t.integer("requested_by").references("users.id").onDelete("SET NULL");
    t.string("requested_by_name", 255).notNullable();
    t.string("filename", 255);
    t.integer("pages");
    t.integer("byte_size");
    // A draft's PDF (a revision's is kept in revision_reports).
    t.binary("pdf");
    t.text("error");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("started_at", { useTz: true });
    t.timestamp("finished_at", { useTz: true });
    t.index(["project_id", "created_at"]);
    t.index(["revision_id"]);
  });
  await knex.raw("ALTER TABLE report_builds ADD CONSTRAINT report_builds_progress_range CHECK (progress >= 0 AND progress <= 1)");
  await knex.raw("ALTER TABLE report_builds ADD CONSTRAINT report_builds_revision_kind CHECK ((kind = 'revision') = (revision_id IS NOT NULL))");

  // The report of an issued revision as it was first built: served byte for byte ever after.
  await knex.schema.createTable("revision_reports", (t) => {
    t.uuid("revision_id").primary().references("revisions.id").onDelete("CASCADE");
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.string("filename", 255).notNullable();
    t.integer("pages").notNullable();
    t.integer("byte_size").notNullable();
    t.boolean("watermark").notNullable();
    t.binary("pdf").notNullable();
    t.timestamp("built_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  // The same guard as the revisions' own (filmsheet_refuse_change, from the checking migration).
  await knex.raw(`
CREATE TRIGGER revision_reports_frozen BEFORE UPDATE OR DELETE ON revision_reports
  FOR EACH ROW EXECUTE FUNCTION filmsheet_refuse_change('project', 'The report of an issued revision is kept as it was issued');
CREATE TRIGGER revision_reports_no_truncate BEFORE TRUNCATE ON revision_reports
  FOR EACH STATEMENT EXECUTE FUNCTION filmsheet_refuse_truncate();`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("revision_reports");
  await knex.schema.dropTable("report_builds");
}

// One draft report at a time per project: a second request while one is queued or running gets
// that one back instead of queueing another build of the same schedule. The database holds the
// rule, so two requests at once cannot both insert.
import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  // Builds already waiting side by side: all but the newest of each project are let go.
  await knex.raw(`
UPDATE report_builds b SET status = 'failed', stage = 'Failed', error = 'Superseded by a newer draft of the same project', finished_at = now()
 WHERE kind = 'draft' AND status IN ('queued', 'running')
   AND EXISTS (SELECT 1 FROM report_builds n WHERE n.project_id = b.project_id AND n.kind = 'draft' AND n.status IN ('queued', 'running') AND n.created_at > b.created_at)`);
  await knex.raw("CREATE UNIQUE INDEX report_builds_one_active_draft ON report_builds (project_id) WHERE kind = 'draft' AND status IN ('queued', 'running')");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("DROP INDEX report_builds_one_active_draft");
}

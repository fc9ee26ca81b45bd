import "server-only";
import { buildSnapshot } from "@/checking/build-snapshot";
import { canonicalJson } from "@/checking/canonical-json";
import { STATE_LABELS } from "@/checking/check-machine";
import { revisionPath } from "@/checking/paths";
import { revisionLetter } from "@/checking/revision-letter";
import type { RevisionSnapshot } from "@/checking/snapshot";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { revisionIssuedEmail } from "@/server/email/revision-issued-email";
import { AppError } from "@/server/http/app-error";
import { appUrl } from "@/server/http/app-url";
import { enqueueEmail } from "@/server/jobs/enqueue-email";
import { notificationRecipients } from "@/server/repositories/notification-recipients";
import { enqueueReportBuild } from "@/server/reports/report-builds";
import { loadSnapshotInputs } from "@/server/repositories/snapshot-inputs";
import { assertReportSize } from "@/server/reports/report-size";
import { assertPlanAllows } from "./assert-plan-allows";
import { actorName, recordAudit } from "./record-audit";

export interface TRevisionSummary {
  id: string;
  letter: string;
  sequence: number;
  issued_by_name: string;
  issued_at: string;
  note: string;
  rows: number;
}

/** A revision just issued, with the build of its report (GET /api/projects/:id/reports/:report_build_id). */
export type TIssuedRevision = TRevisionSummary & { report_build_id: string };

// What makes two revisions the same: the inputs and results. A second click, or a second checker
// issuing at the same moment, must not make an identical revision B.
// Versions are bookkeeping: a save that changed no value is not a change.
const unversioned = (items: readonly { version: number }[]) => items.map(({ version: _v, ...rest }) => rest);
const substance = (s: Pick<RevisionSnapshot, "project" | "design_cases" | "zones" | "buildups" | "surfaces" | "duct_runs">) =>
  canonicalJson([s.project, ...[s.design_cases, s.zones, s.buildups, s.surfaces, s.duct_runs].map(unversioned)]);

/**
 * A checker issues the next revision (A, B, C …) of a project whose every row is accepted: the
 * schedule, its results for every design case, the check states and the comments are frozen as
 * one snapshot that the database never lets change. Free-plan firms cannot issue (402).
 */
export async function issueRevision(actor: Actor, projectId: string, input: { note?: string }): Promise<TIssuedRevision> {
  if (actor.userId === null) throw new AppError("forbidden", "A revision is issued by a person: sign in to issue it (API tokens cannot)");
  return db().transaction(async (trx) => {
    // One issue at a time per project: the second waits here and then sees the first's revision.
    const project = await trx("projects").where({ id: projectId, firm_id: actor.firm.id }).forUpdate().first("id", "name", "reference");
    if (!project) throw new AppError("not_found", "No project with that id in this firm");
    const plan = await assertPlanAllows(trx, actor.firm.id, { revisions: true });

    const inputs = (await loadSnapshotInputs(trx, actor.firm.id, projectId))!;
    if (inputs.checks.length === 0) throw new AppError("conflict", "There is nothing to issue: the schedule has no surfaces or duct runs");
    // The revision's report is built as it is issued: one too large to build is refused first.
    assertReportSize({ rows: inputs.surfaces.length + inputs.duct_runs.length, cases: inputs.design_cases.length });
    const open = inputs.checks.filter((c) => c.state !== "accepted");
    if (open.length > 0) {
      const by = (s: string) => open.filter((c) => c.state === s).length;
      const parts = (["unchecked", "queried"] as const).filter((s) => by(s) > 0).map((s) => `${by(s)} ${STATE_LABELS[s].toLowerCase()}`);
      throw new AppError("conflict", `Every row must be accepted before a revision is issued: ${parts.join(" and ")}`, open.slice(0, 100).map((c) => ({ field: `${c.sheet}.${c.row_id}`, message: c.state })));
    }

    const last = await trx("revisions").where({ project_id: projectId }).orderBy("sequence", "desc").first("sequence", "letter", "snapshot");
    if (last && substance(last.snapshot as RevisionSnapshot) === substance(inputs)) {
      throw new AppError("conflict", `Nothing in the schedule has changed since revision ${last.letter}`);
    }
    const sequence = (last?.sequence ?? 0) + 1;
    const letter = revisionLetter(sequence);
    const snapshot = buildSnapshot(inputs);
    const [row] = await trx("revisions")
      .insert({ firm_id: actor.firm.id, project_id: projectId, sequence, letter, issued_by: actor.userId, issued_by_name: actorName(actor), note: input.note ?? "", snapshot: JSON.stringify(snapshot) })
      .returning(["id", "letter", "sequence", "issued_by_name", "issued_at", "note"]);
    const rows = inputs.checks.length;
    await recordAudit(trx, actor, [{ projectId, entity: "revision", entityId: row.id, action: "issue", after: { letter, sequence, note: row.note, rows } }]);
    // Its report is built by the job once this commits and then stored with it for good, clean
    // as the firm's plan allows at the moment of issue.
    const [build] = await trx("report_builds")
      .insert({ firm_id: actor.firm.id, project_id: projectId, revision_id: row.id, kind: "revision", watermark: !plan.limits.cleanReport, requested_by: actor.userId, requested_by_name: actorName(actor) })
      .returning(["id"]);
    await enqueueReportBuild(trx, build.id);

    const to = await notificationRecipients(trx, actor.firm.id, projectId, { roles: ["consultant", "checker", "viewer"], exclude: actor.userId });
    for (const r of to) {
      await enqueueEmail(revisionIssuedEmail({ to: r.email, firmName: actor.firm.name, project, letter, issuer: actorName(actor), note: row.note, rows, url: appUrl(revisionPath(projectId, letter)) }), trx);
    }
    return { ...row, issued_at: new Date(row.issued_at).toISOString(), rows, report_build_id: build.id };
  });
}

import "server-only";
import type { Knex } from "knex";
import { FREE_PLAN, type TPlan } from "@/schemas/billing";
import { AppError } from "@/server/http/app-error";
import { getPlan } from "./get-plan";

/** A count the change would leave behind: a number, or a function that counts (see below). */
export type PlanCount = number | (() => Promise<number>);

export interface PlanNeeds {
  /** Projects the firm will hold once the change is saved (creating the second project: 2). */
  projects?: PlanCount;
  /** Rows (surfaces + duct runs) the one project will hold once the change is saved. */
  rows?: PlanCount;
  /**
   * Rows the project held before the change (from `rowsBeforeChange`). With it, a change that does
   * not add rows passes even past the limit: replacing a sheet by as many rows (export, edit,
   * import back), or editing a project that holds more than the free plan does (the firm stopped
   * paying, or the demo). Without it, every count over the limit is refused.
   */
  rowsBefore?: number | null;
  /** Design cases the one project will hold once the change is saved. */
  designCases?: PlanCount;
  /** The change issues a revision. */
  revisions?: true;
  /** The change produces a report without the "not for issue" watermark. */
  cleanReport?: true;
}

const UPGRADE = "A firm admin can upgrade under Firm › Billing; nothing already saved is removed.";

/**
 * The one paid-tier check. Free firms get one project, 40 rows per project, watermarked reports
 * and no revisions; paid firms (subscription active or trialing) get everything. Call it inside
 * the transaction that makes the change, before or after the write: when it throws, roll back
 * and nothing is saved.
 *
 * Counts are totals *after* the change, not increments: adding 3 rows to a project of 38 rows
 * passes `rows: 41`. Pass a function instead of a number to count race-free: for a free firm the
 * check first locks the firm's row (SELECT … FOR UPDATE), then calls your function, so two
 * concurrent writers of one firm cannot both take the last place. Paid firms take no lock and
 * your function is never called.
 *
 * @param trx the transaction of the change.
 * @param firmId the acting firm (`actor.firm.id`).
 * @param needs what the change needs; omitted keys are not checked.
 * @returns the firm's plan (for callers that also word a notice).
 * @throws AppError `plan_limit` (HTTP 402 through route(); the form's message through action())
 *   with a message naming the limit and the upgrade path, and `details` = `{ limit, allowed,
 *   requested, upgradePath: "/firm/billing" }`.
 * @example
 *   // creating a project (src/server/services/create-project.ts)
 *   await assertPlanAllows(trx, actor.firm.id, { projects: async () => (await countProjects(trx)) + 1 });
 *   // adding rows to a schedule: count after inserting, inside the same transaction
 *   await assertPlanAllows(trx, actor.firm.id, { rows: () => countRows(trx, projectId) });
 *   // a change that deletes rows first (a replace import): only growth past the limit is refused
 *   const rowsBefore = await rowsBeforeChange(trx, actor.firm.id, () => countRows(trx, projectId));
 *   // … deletes and inserts …
 *   await assertPlanAllows(trx, actor.firm.id, { rows: () => countRows(trx, projectId), rowsBefore });
 *   // issuing a revision / a clean report
 *   await assertPlanAllows(trx, actor.firm.id, { revisions: true });
 */
export async function assertPlanAllows(trx: Knex.Transaction, firmId: string, needs: PlanNeeds): Promise<TPlan> {
  const plan = await getPlan(firmId, trx);
  if (plan.plan === "paid") return plan;
  await trx("firms").where({ id: firmId }).forUpdate().first("id");
  const count = async (c: PlanCount) => (typeof c === "number" ? c : await c());

  if (needs.projects !== undefined) {
    const requested = await count(needs.projects);
    if (requested > FREE_PLAN.projects) {
      throw refuse("projects", FREE_PLAN.projects, requested, `The free plan holds ${FREE_PLAN.projects} project; a paid plan has no limit. ${UPGRADE}`);
    }
  }
  if (needs.rows !== undefined) {
    const requested = await count(needs.rows);
    const grows = needs.rowsBefore === undefined || needs.rowsBefore === null || requested > needs.rowsBefore;
    if (requested > FREE_PLAN.rowsPerProject && grows) {
      throw refuse("rows", FREE_PLAN.rowsPerProject, requested, `The free plan holds ${FREE_PLAN.rowsPerProject} rows per project (this change would make ${requested}); a paid plan has no limit. ${UPGRADE}`);
    }
  }
  if (needs.designCases !== undefined) {
    const requested = await count(needs.designCases);
    if (requested > FREE_PLAN.designCasesPerProject) {
      throw refuse("designCases", FREE_PLAN.designCasesPerProject, requested, `The free plan holds ${FREE_PLAN.designCasesPerProject} design cases per project (this change would make ${requested}); a paid plan has no limit. ${UPGRADE}`);
    }
  }
  if (needs.revisions) throw refuse("revisions", 0, 1, `Issuing revisions needs a paid plan. ${UPGRADE}`);
  if (needs.cleanReport) throw refuse("cleanReport", 0, 1, `Reports without the “not for issue” mark need a paid plan. ${UPGRADE}`);
  return plan;
}

/**
 * The rows a project holds before a change that may delete rows and then add others, for
 * `rowsBefore`: for a free firm counted under the same lock as the check (so two writers of one
 * firm cannot both count the old total); null for a paid firm, which has no limit (no lock, no count).
 */
export async function rowsBeforeChange(trx: Knex.Transaction, firmId: string, count: () => Promise<number>): Promise<number | null> {
  if ((await getPlan(firmId, trx)).plan === "paid") return null;
  await trx("firms").where({ id: firmId }).forUpdate().first("id");
  return count();
}

function refuse(limit: keyof PlanNeeds, allowed: number, requested: number, message: string): AppError {
  return new AppError("plan_limit", message, { limit, allowed, requested, upgradePath: "/firm/billing" });
}

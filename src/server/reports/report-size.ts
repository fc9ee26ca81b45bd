import "server-only";
import type { Knex } from "knex";
import { REPORT_LIMITS } from "@/schemas/reports";
import { AppError } from "@/server/http/app-error";

/** What a report of a project's schedule as it stands would cover: rows and design cases. */
export async function draftReportSize(q: Knex | Knex.Transaction, projectId: string): Promise<{ rows: number; cases: number }> {
  const { rows } = await q.raw<{ rows: { rows: string; cases: string }[] }>(
    `select (select count(*) from surfaces where project_id = :p) + (select count(*) from duct_runs where project_id = :p) as rows,
            (select count(*) from design_cases where project_id = :p) as cases`,
    { p: projectId },
  );
  return { rows: Number(rows[0]!.rows), cases: Number(rows[0]!.cases) };
}

/**
 * Refuses, before anything is built, a report larger than `limit` row-cases (rows × design
 * cases): 413 `payload_too_large`, naming both counts and what to do instead.
 */
export function assertReportSize(size: { rows: number; cases: number }, limit: number = REPORT_LIMITS.rowCases, instead?: string): void {
  const rowCases = size.rows * Math.max(1, size.cases);
  if (rowCases <= limit) return;
  const advice = instead ?? "Split the schedule into smaller projects, or remove design cases the report need not cover.";
  throw new AppError(
    "payload_too_large",
    `A report of ${size.rows} rows × ${size.cases} design cases covers ${rowCases} row-cases; at most ${limit} are built. ${advice}`,
    [{ field: "rows × design cases", message: `${rowCases} > ${limit}`, rows: size.rows, cases: size.cases, limit }],
  );
}

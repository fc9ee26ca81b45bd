import "server-only";
import { buildReport, type BuiltReport } from "@/report/build-report";
import { reportUnits } from "@/report/units-adapter";
import { engineDesignCase, engineSchedule } from "@/schedule/engine-schedule";
import type { Actor } from "@/server/auth/actor";
import { describeReportProject } from "./describe-report-project";
import { db } from "@/server/db/knex";
import { checkStatesOf } from "@/server/repositories/row-checks";
import { getScheduleOrThrow } from "./get-schedule";

/**
 * The draft calculation report of a project: the schedule as it stands, computed by the engine,
 * watermarked "not for issue" on every page as every draft is. (An issued revision's report is
 * clean only for a paid firm: `status === "draft" || !plan.limits.cleanReport`.)
 */
export async function buildProjectReport(actor: Actor, projectId: string): Promise<BuiltReport & { filename: string }> {
  const s = await getScheduleOrThrow(actor, projectId);
  // Each row's check state as it stands, for the row tables.
  const checks = await checkStatesOf(db(), actor.firm.id, projectId);
  const p = s.project;
  const site = describeReportProject(p);
  const built = buildReport({
    meta: {
      projectName: site.projectName,
      projectReference: site.projectReference,
      siteDescription: site.siteDescription,
      firmName: actor.firm.name,
      author: actor.name ?? actor.email ?? "API token",
      checker: null,
      date: new Date().toISOString().slice(0, 10),
      status: "draft",
      revision: null,
      unitSystem: p.unit_system,
      watermark: true,
    },
    schedule: engineSchedule(s),
    designCases: s.design_cases.map(engineDesignCase),
    checks,
    convert: reportUnits(p.unit_system),
  });
  return { ...built, filename: `${site.fileStem}-draft-report.pdf` };
}

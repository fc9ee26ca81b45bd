import "server-only";
import { buildReport, type BuiltReport } from "@/report/build-report";
import { reportUnits } from "@/report/units-adapter";
import { engineDesignCase, engineSchedule } from "@/schedule/engine-schedule";
import type { Actor } from "@/server/auth/actor";
import { getScheduleOrThrow } from "./get-schedule";

/**
 * The draft calculation report of a project: the schedule as it stands, computed by the engine,
 * watermarked "not for issue" on every page as every draft is. (An issued revision's report is
 * clean only for a paid firm: `status === "draft" || !plan.limits.cleanReport`.)
 */
export async function buildProjectReport(actor: Actor, projectId: string): Promise<BuiltReport & { filename: string }> {
  const s = await getScheduleOrThrow(actor, projectId);
  const p = s.project;
  const built = buildReport({
    meta: {
      projectName: p.name,
      projectReference: p.reference,
      siteDescription: `${p.terrain} terrain, ${p.altitude_m} m above sea level, ${p.wind_law}-law wind profile`,
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
    convert: reportUnits(p.unit_system),
  });
  const safe = p.reference.replace(/[^A-Za-z0-9._-]+/g, "-");
  return { ...built, filename: `${safe}-draft-report.pdf` };
}

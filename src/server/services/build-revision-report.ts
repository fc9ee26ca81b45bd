import "server-only";
import { snapshotSchedule } from "@/checking/build-snapshot";
import { buildReport, type BuiltReport } from "@/report/build-report";
import { reportUnits } from "@/report/units-adapter";
import type { Actor } from "@/server/auth/actor";
import { describeReportProject } from "./describe-report-project";
import type { UnitSystem } from "@/units/units";
import { getPlan } from "./get-plan";
import { getRevisionOrThrow } from "./get-revision";

/**
 * The calculation report of an issued revision, made from its frozen snapshot (so it reads the
 * same whenever it is asked for): status "issued", its letter, its checkers and every row's check
 * state. Clean for a paid firm; a free firm's carries the "not for issue" mark like every report.
 */
export async function buildRevisionReport(actor: Actor, projectId: string, letter: string): Promise<BuiltReport & { filename: string }> {
  const [r, plan] = await Promise.all([getRevisionOrThrow(actor, projectId, letter), getPlan(actor.firm.id)]);
  const s = r.snapshot;
  const p = s.project;
  const checkers = [...new Set(s.checks.map((c) => c.checked_by_name).filter((n): n is string => n !== null))].sort();
  const site = describeReportProject(p);
  const built = buildReport({
    meta: {
      projectName: site.projectName,
      projectReference: site.projectReference,
      siteDescription: site.siteDescription,
      firmName: actor.firm.name,
      author: s.authors && s.authors.length > 0 ? s.authors.join(", ") : r.issued_by_name,
      checker: checkers.length > 0 ? checkers.join(", ") : r.issued_by_name,
      date: r.issued_at.slice(0, 10),
      status: "issued",
      revision: r.letter,
      unitSystem: p.unit_system as UnitSystem,
      watermark: !plan.limits.cleanReport,
    },
    schedule: snapshotSchedule(s),
    designCases: s.design_cases,
    checks: Object.fromEntries(s.checks.map((c) => [c.row_id, c.state])),
    convert: reportUnits(p.unit_system as UnitSystem),
  });
  return { ...built, filename: `${site.fileStem}-revision-${r.letter}-report.pdf` };
}

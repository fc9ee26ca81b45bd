import "server-only";
import type { ReportMeta } from "@/report/types";

type Site = { name: string; reference: string; terrain: string; altitude_m: number; wind_law: string };

/** The report's words for a project and its site, and a file name made from its reference. */
export function describeReportProject(p: Site): Pick<ReportMeta, "projectName" | "projectReference" | "siteDescription"> & { fileStem: string } {
  return {
    projectName: p.name,
    projectReference: p.reference,
    siteDescription: `${p.terrain} terrain, ${p.altitude_m} m above sea level, ${p.wind_law}-law wind profile`,
    fileStem: p.reference.replace(/[^A-Za-z0-9._-]+/g, "-"),
  };
}

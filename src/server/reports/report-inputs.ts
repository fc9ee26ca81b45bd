import "server-only";
import type { Knex } from "knex";
import { snapshotSchedule } from "@/checking/build-snapshot";
import type { RevisionSnapshot } from "@/checking/snapshot";
import type { ReportInput } from "@/report/types";
import { reportUnits } from "@/report/units-adapter";
import { engineDesignCase, engineSchedule } from "@/schedule/engine-schedule";
import { AppError } from "@/server/http/app-error";
import { checkStatesOf } from "@/server/repositories/row-checks";
import { loadSchedule } from "@/server/repositories/schedule";
import { describeReportProject } from "@/server/services/describe-report-project";
import { reportPeople } from "./report-people";
import type { UnitSystem } from "@/units/units";

/** What a report is built from, and the file name it is downloaded as. */
export interface ReportSource {
  input: ReportInput;
  filename: string;
}

type Firm = { id: string; name: string };

/**
 * A draft report of the schedule as it stands, computed by the engine, with each row's check
 * state and the people behind them (`author` only when nobody is recorded); watermarked "not for issue" on every page, as every draft is.
 */
export async function draftReportSource(q: Knex, firm: Firm, projectId: string, author: string, today = new Date()): Promise<ReportSource> {
  const s = await loadSchedule(q, firm.id, projectId);
  if (!s) throw new AppError("not_found", "No project with that id in this firm");
  const checks = await checkStatesOf(q, firm.id, projectId);
  const p = s.project;
  const site = describeReportProject(p);
  const people = await reportPeople(q, firm.id, projectId, s.surfaces.length + s.duct_runs.length, author);
  return {
    filename: `${site.fileStem}-draft-report.pdf`,
    input: {
      meta: { ...pick(site), firmName: firm.name, ...people, date: today.toISOString().slice(0, 10), status: "draft", revision: null, unitSystem: p.unit_system, watermark: true },
      schedule: engineSchedule(s),
      designCases: s.design_cases.map(engineDesignCase),
      checks,
      convert: reportUnits(p.unit_system),
    },
  };
}

/** An issued revision as the database holds it. */
export interface RevisionRecord {
  letter: string;
  issued_by_name: string;
  issued_at: string | Date;
  snapshot: RevisionSnapshot;
}

/**
 * The report of an issued revision, from its frozen snapshot: status "issued", its letter, its
 * authors and checkers, and every row's check state. `watermark` is decided by the caller from
 * the firm's plan when the revision's report is first asked for.
 */
export function revisionReportSource(firm: Firm, r: RevisionRecord, watermark: boolean): ReportSource {
  const s = r.snapshot;
  const p = s.project;
  const checkers = [...new Set(s.checks.map((c) => c.checked_by_name).filter((n): n is string => n !== null))].sort();
  const site = describeReportProject(p);
  const unitSystem = p.unit_system as UnitSystem;
  return {
    filename: `${site.fileStem}-revision-${r.letter}-report.pdf`,
    input: {
      meta: {
        ...pick(site),
        firmName: firm.name,
        author: s.authors && s.authors.length > 0 ? s.authors.join(", ") : r.issued_by_name,
        checker: checkers.length > 0 ? checkers.join(", ") : r.issued_by_name,
        date: new Date(r.issued_at).toISOString().slice(0, 10),
        status: "issued",
        revision: r.letter,
        unitSystem,
        watermark,
      },
      schedule: snapshotSchedule(s),
      designCases: s.design_cases,
      checks: Object.fromEntries(s.checks.map((c) => [c.row_id, c.state])),
      convert: reportUnits(unitSystem),
    },
  };
}

const pick = ({ projectName, projectReference, siteDescription }: ReturnType<typeof describeReportProject>) => ({ projectName, projectReference, siteDescription });

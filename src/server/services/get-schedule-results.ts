import "server-only";
import type { ScheduleResults } from "@/calc/index";
import { resultsFor } from "@/schedule/engine-schedule";
import type { Actor } from "@/server/auth/actor";
import { AppError } from "@/server/http/app-error";
import { getScheduleOrThrow } from "./get-schedule";

/** The authoritative results of a project for one design case: every row and the zone totals. */
export async function getScheduleResults(actor: Actor, projectId: string, caseId: string): Promise<ScheduleResults & { case_name: string }> {
  const schedule = await getScheduleOrThrow(actor, projectId);
  const dc = schedule.design_cases.find((d) => d.id === caseId);
  if (!dc) throw new AppError("not_found", "No design case with that id in this project");
  return { case_name: dc.name, ...resultsFor(schedule, dc) };
}

import "server-only";
import type { TSchedule } from "@/schemas/schedule";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { loadSchedule } from "@/server/repositories/schedule";

/** The whole schedule of one project of this firm: site, design cases, zones, build-ups and rows. */
export async function getScheduleOrThrow(actor: Actor, projectId: string): Promise<TSchedule> {
  const schedule = await loadSchedule(db(), actor.firm.id, projectId);
  if (!schedule) throw new AppError("not_found", "No project with that id in this firm");
  return schedule;
}

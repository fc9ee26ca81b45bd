import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { ZProjectParams } from "@/schemas/project";
import { hasAnyRole } from "@/server/auth/actor";
import { requirePageActor } from "@/server/auth/get-viewer";
import { AppError } from "@/server/http/app-error";
import { DRAFT_READERS } from "@/server/checking/roles";
import { getProjectOrThrow } from "@/server/services/get-project";
import { getPreferences } from "@/server/services/get-preferences";
import { getScheduleOrThrow } from "@/server/services/get-schedule";
import { ScheduleProvider } from "@/components/schedule/schedule-context";
import { packSchedule } from "@/schedule/packed-schedule";
import { IssuedProjectHeader } from "./_checking/issued-project-header";
import { ProjectHeader } from "./project-header";
import "@/components/schedule/project-wide.css";

// Every page of a project shares one load of its schedule, handed to the browser's query cache.
export default async function ProjectLayout({ children, params }: { children: ReactNode; params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const actor = await requirePageActor(`/projects/${projectId}`);
  if (!ZProjectParams.safeParse({ projectId }).success) notFound();
  // Viewers read issued revisions only: their pages get the project's name, never the draft.
  if (!hasAnyRole(actor, DRAFT_READERS)) {
    const project = await getProjectOrThrow(actor, projectId).catch((error) => {
      if (error instanceof AppError && error.code === "not_found") notFound();
      throw error;
    });
    return (
      <div className="grid gap-5">
        <IssuedProjectHeader project={project} />
        {children}
      </div>
    );
  }
  const schedule = await getScheduleOrThrow(actor, projectId).catch((error) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
  const preferences = await getPreferences(actor);
  return (
    // Keyed by project: moving from one project to another starts a fresh cache seeded with its schedule.
    // An archived project is read-only for everyone (the server refuses its changes as well).
    // The schedule goes packed, as JSON text: the browser reads it with one JSON.parse, where the
    // same rows as props cost a callback per value in the payload's reader (5,000 rows: ≈ 150,000),
    // and packed it is ≈ 40 % of the page's bytes it was as objects.
    <ScheduleProvider key={projectId} initialJson={JSON.stringify(packSchedule(schedule))} preferences={preferences} canEdit={hasAnyRole(actor, ["consultant"]) && schedule.project.archived_at === null}>
      <div className="fs-project grid gap-5">
        <ProjectHeader canReport={hasAnyRole(actor, ["admin", "consultant", "checker"])} />
        {children}
      </div>
    </ScheduleProvider>
  );
}

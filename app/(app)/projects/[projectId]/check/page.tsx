import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import { revisionsPath } from "@/checking/paths";
import { ZBoardQuery } from "@/schemas/checking";
import { ZProjectParams } from "@/schemas/project";
import { hasAnyRole } from "@/server/auth/actor";
import { requirePageActor } from "@/server/auth/get-viewer";
import { DRAFT_READERS } from "@/server/checking/roles";
import { AppError } from "@/server/http/app-error";
import { getCheckBoard } from "@/server/services/get-check-board";
import { getNotificationMute } from "@/server/services/get-notification-mute";
import { getPlan } from "@/server/services/get-plan";
import { CheckView } from "./check-view";

export const metadata: Metadata = { title: "Check" };

export default async function CheckPage({ params, searchParams }: { params: Promise<{ projectId: string }>; searchParams: Promise<Record<string, string | string[]>> }) {
  const { projectId } = await params;
  const actor = await requirePageActor(`/projects/${projectId}/check`);
  if (!ZProjectParams.safeParse({ projectId }).success) notFound();
  // Viewers read what was issued, never the draft.
  if (!hasAnyRole(actor, DRAFT_READERS)) redirect(revisionsPath(projectId));
  const filter = ZBoardQuery.safeParse(await searchParams);
  const [board, mute, plan] = await Promise.all([getCheckBoard(actor, projectId, filter.success ? filter.data : {}), getNotificationMute(actor, projectId), getPlan(actor.firm.id)]).catch((error: unknown) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
  return (
    <CheckView
      board={board}
      filter={filter.success ? filter.data : {}}
      muted={mute.muted}
      canCheck={hasAnyRole(actor, ["checker"]) && actor.userId !== null}
      canRequest={hasAnyRole(actor, ["consultant"])}
      userId={actor.userId}
      freePlan={plan.limits.revisions ? null : { isAdmin: hasAnyRole(actor, ["admin"]) }}
    />
  );
}

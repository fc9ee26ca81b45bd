import type { Metadata } from "next";
import { hasAnyRole } from "@/server/auth/actor";
import { DRAFT_READERS } from "@/server/checking/roles";
import { getNotificationMute } from "@/server/services/get-notification-mute";
import { getPlan } from "@/server/services/get-plan";
import { getProjectOrThrow } from "@/server/services/get-project";
import { listRevisions } from "@/server/services/list-revisions";
import { orNotFound, projectPageActor } from "../_checking/revision-access";
import { RevisionsView } from "./revisions-view";

export const metadata: Metadata = { title: "Revisions" };

export default async function RevisionsPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const actor = await projectPageActor(projectId, `/projects/${projectId}/revisions`);
  const [project, revisions, mute, plan] = await orNotFound(Promise.all([getProjectOrThrow(actor, projectId), listRevisions(actor, projectId), getNotificationMute(actor, projectId), getPlan(actor.firm.id)]));
  const freePlan = plan.limits.revisions ? null : { isAdmin: hasAnyRole(actor, ["admin"]) };
  return <RevisionsView project={project} revisions={revisions} muted={mute.muted} readsDraft={hasAnyRole(actor, DRAFT_READERS)} freePlan={freePlan} />;
}

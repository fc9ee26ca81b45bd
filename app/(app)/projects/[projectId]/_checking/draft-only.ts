import "server-only";
import { redirect } from "next/navigation";
import { revisionsPath } from "@/checking/paths";
import { hasAnyRole } from "@/server/auth/actor";
import { requirePageActor } from "@/server/auth/get-viewer";
import { DRAFT_READERS } from "@/server/checking/roles";

export type DraftPageProps = { params: Promise<{ projectId: string }> };

/** For pages of the draft (the schedule and its parts): a viewer is sent to the issued revisions. */
export async function draftOnly(params: DraftPageProps["params"]): Promise<void> {
  const { projectId } = await params;
  const actor = await requirePageActor(`/projects/${projectId}`);
  if (!hasAnyRole(actor, DRAFT_READERS)) redirect(revisionsPath(projectId));
}

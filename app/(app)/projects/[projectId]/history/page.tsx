import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { revisionsPath } from "@/checking/paths";
import { ZHistoryQuery } from "@/schemas/checking";
import { hasAnyRole } from "@/server/auth/actor";
import { DRAFT_READERS } from "@/server/checking/roles";
import { getProjectOrThrow } from "@/server/services/get-project";
import { listProjectHistory } from "@/server/services/list-project-history";
import { orNotFound, projectPageActor } from "../_checking/revision-access";
import { HistoryView } from "./history-view";

export const metadata: Metadata = { title: "History" };

export default async function HistoryPage({ params, searchParams }: { params: Promise<{ projectId: string }>; searchParams: Promise<Record<string, string | string[]>> }) {
  const { projectId } = await params;
  const actor = await projectPageActor(projectId, `/projects/${projectId}/history`);
  if (!hasAnyRole(actor, DRAFT_READERS)) redirect(revisionsPath(projectId));
  const query = ZHistoryQuery.safeParse(await searchParams);
  const opts = query.success ? query.data : { limit: 50 };
  const [project, page] = await orNotFound(Promise.all([getProjectOrThrow(actor, projectId), listProjectHistory(actor, projectId, opts)]));
  return <HistoryView project={project} entries={page.entries} nextBefore={page.next_before} />;
}

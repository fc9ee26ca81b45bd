import type { Metadata } from "next";
import { ZCompareQuery } from "@/schemas/checking";
import { compareProjectRevisions } from "@/server/services/compare-project-revisions";
import { getProjectOrThrow } from "@/server/services/get-project";
import { orNotFound, projectPageActor } from "../../_checking/revision-access";
import { CompareView } from "./compare-view";

export const metadata: Metadata = { title: "Compare revisions" };

export default async function ComparePage({ params, searchParams }: { params: Promise<{ projectId: string }>; searchParams: Promise<Record<string, string | string[]>> }) {
  const { projectId } = await params;
  const actor = await projectPageActor(projectId, `/projects/${projectId}/revisions/compare`);
  const project = await orNotFound(getProjectOrThrow(actor, projectId));
  const query = ZCompareQuery.safeParse(await searchParams);
  if (!query.success) return <CompareView project={project} problem="Choose two revisions to compare, e.g. A and B." />;
  if (query.data.from === query.data.to) return <CompareView project={project} problem="Choose two different revisions." />;
  const comparison = await orNotFound(compareProjectRevisions(actor, projectId, query.data.from, query.data.to));
  return <CompareView project={project} comparison={comparison} />;
}

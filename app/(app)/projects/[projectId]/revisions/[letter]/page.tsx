import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { ZRevisionParams } from "@/schemas/checking";
import { getRevisionOrThrow } from "@/server/services/get-revision";
import { getRevisionReportState } from "@/server/services/get-revision-report-state";
import { orNotFound, projectPageActor } from "../../_checking/revision-access";
import { RevisionView } from "./revision-view";

export const metadata: Metadata = { title: "Revision" };

export default async function RevisionPage({ params, searchParams }: { params: Promise<{ projectId: string; letter: string }>; searchParams: Promise<{ case?: string }> }) {
  const { projectId, letter } = await params;
  const actor = await projectPageActor(projectId, `/projects/${projectId}/revisions/${letter}`);
  if (!ZRevisionParams.safeParse({ projectId, letter }).success) notFound();
  const revision = await orNotFound(getRevisionOrThrow(actor, projectId, letter));
  const report = await getRevisionReportState(actor, projectId, revision.id);
  return <RevisionView revision={revision} caseId={(await searchParams).case} reportBuild={report.stored ? null : report.build} />;
}

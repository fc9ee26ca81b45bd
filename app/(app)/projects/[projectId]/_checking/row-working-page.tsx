import { notFound, redirect } from "next/navigation";
import type { TCheckSheet } from "@/checking/check-machine";
import { revisionsPath } from "@/checking/paths";
import { ZRowParams, ZWorkingQuery } from "@/schemas/checking";
import { hasAnyRole } from "@/server/auth/actor";
import { requirePageActor } from "@/server/auth/get-viewer";
import { DRAFT_READERS } from "@/server/checking/roles";
import { AppError } from "@/server/http/app-error";
import { getRowWorking } from "@/server/services/get-row-working";
import { listProjectHistory } from "@/server/services/list-project-history";
import { RowWorkingView } from "./row-working-view";

export type RowPageProps = { params: Promise<{ projectId: string; rowId: string }>; searchParams: Promise<Record<string, string | string[]>> };

/** The page of one row's working, shared by surfaces and duct runs. */
export async function RowWorkingPage({ sheet, params, searchParams }: RowPageProps & { sheet: TCheckSheet }) {
  const { projectId, rowId } = await params;
  const segment = sheet === "surfaces" ? "surfaces" : "duct-runs";
  const actor = await requirePageActor(`/projects/${projectId}/${segment}/${rowId}`);
  if (!ZRowParams.safeParse({ projectId, itemId: rowId }).success) notFound();
  if (!hasAnyRole(actor, DRAFT_READERS)) redirect(revisionsPath(projectId));
  const query = ZWorkingQuery.safeParse(await searchParams);
  const [data, history] = await Promise.all([
    getRowWorking(actor, projectId, sheet, rowId, query.success ? query.data.case : undefined),
    listProjectHistory(actor, projectId, { entityId: rowId, limit: 30 }),
  ]).catch((error: unknown) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
  return (
    <RowWorkingView
      data={data}
      history={history.entries}
      canCheck={hasAnyRole(actor, ["checker"]) && actor.userId !== null}
      canComment={hasAnyRole(actor, ["consultant", "checker"])}
      isConsultant={hasAnyRole(actor, ["consultant"])}
      isLastEditor={actor.userId !== null && data.check.last_edited_by === actor.userId}
    />
  );
}

"use server";
// Server actions of the checking pages: the same services as the API routes, behind action().
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { STATE_LABELS } from "@/checking/check-machine";
import { ZAcceptRows, ZCheckMove, ZCheckRequest, ZIssueRevision, ZNotificationMute, ZRowComment, ZSheetParam } from "@/schemas/checking";
import { ZProjectParams } from "@/schemas/project";
import { action } from "@/server/http/action";
import { acceptRows } from "@/server/services/accept-rows";
import { checkRow } from "@/server/services/check-row";
import { commentOnRow } from "@/server/services/comment-on-row";
import { issueRevision } from "@/server/services/issue-revision";
import { requestCheck } from "@/server/services/request-check";
import { setNotificationMute } from "@/server/services/set-notification-mute";

const ZRow = ZProjectParams.extend({ sheet: ZSheetParam, rowId: z.uuid({ error: "Row id must be a UUID" }) });
// Every checking page shows check states: refresh the whole project section after a change.
const refresh = (projectId: string) => revalidatePath(`/projects/${projectId}`, "layout");

export const checkRowAction = action({ roles: ["checker"], input: z.intersection(ZRow, ZCheckMove) }, async ({ actor, input }) => {
  const out = await checkRow(actor, input.projectId, input.sheet, input.rowId, input);
  refresh(input.projectId);
  return { ok: true, message: `${STATE_LABELS[out.state]}`, data: { state: out.state } };
});

export const commentAction = action({ roles: ["consultant", "checker"], input: ZRow.extend(ZRowComment.shape) }, async ({ actor, input }) => {
  const c = await commentOnRow(actor, input.projectId, input.sheet, input.rowId, input);
  refresh(input.projectId);
  return { ok: true, message: c.kind === "answer" ? "Answer added; the checker has been told" : "Comment added" };
});

export const acceptRowsAction = action({ roles: ["checker"], input: ZProjectParams.extend(ZAcceptRows.shape) }, async ({ actor, input }) => {
  const { accepted } = await acceptRows(actor, input.projectId, input);
  refresh(input.projectId);
  return { ok: true, message: `${accepted} ${accepted === 1 ? "row" : "rows"} accepted` };
});

export const requestCheckAction = action({ roles: ["consultant"], input: ZProjectParams.extend(ZCheckRequest.shape) }, async ({ actor, input }) => {
  const { notified } = await requestCheck(actor, input.projectId, input);
  refresh(input.projectId);
  return { ok: true, message: notified === 0 ? "Check requested; no checker receives e-mail about this project" : `Check requested: ${notified} ${notified === 1 ? "checker" : "checkers"} e-mailed` };
});

export const issueRevisionAction = action({ roles: ["checker"], input: ZProjectParams.extend(ZIssueRevision.shape) }, async ({ actor, input }) => {
  const r = await issueRevision(actor, input.projectId, input);
  refresh(input.projectId);
  return { ok: true, message: `Revision ${r.letter} issued`, data: { letter: r.letter } };
});

export const muteAction = action({ input: ZProjectParams.extend(ZNotificationMute.shape) }, async ({ actor, input }) => {
  const { muted } = await setNotificationMute(actor, input.projectId, input.muted);
  refresh(input.projectId);
  return { ok: true, message: muted ? "E-mail about this project is muted" : "E-mail about this project is on" };
});

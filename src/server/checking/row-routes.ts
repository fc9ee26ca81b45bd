import "server-only";
import type { TCheckSheet } from "@/checking/check-machine";
import { ZCheckMove, ZHistoryQuery, ZRowComment, ZRowParams, ZWorkingQuery } from "@/schemas/checking";
import { route } from "@/server/http/route";
import { checkRow } from "@/server/services/check-row";
import { commentOnRow } from "@/server/services/comment-on-row";
import { getRowWorking } from "@/server/services/get-row-working";
import { listProjectHistory } from "@/server/services/list-project-history";
import { listRowComments } from "@/server/services/list-row-comments";
import { findRowOrThrow } from "@/server/repositories/row-checks";
import { db } from "@/server/db/knex";
import { DRAFT_READERS } from "./roles";

// The checking routes of one row, shared by surfaces and duct runs: the route files under
// app/api/projects/[projectId]/<sheet>/[itemId]/… stay one line per method.

export const checkRowRoute = (sheet: TCheckSheet) =>
  route({ roles: ["checker"], params: ZRowParams, body: ZCheckMove }, ({ actor, params, body }) => checkRow(actor, params.projectId, sheet, params.itemId, body));

export const listCommentsRoute = (sheet: TCheckSheet) =>
  route({ roles: DRAFT_READERS, params: ZRowParams }, async ({ actor, params }) => ({ comments: await listRowComments(actor, params.projectId, sheet, params.itemId) }));

export const addCommentRoute = (sheet: TCheckSheet) =>
  route({ roles: ["consultant", "checker"], params: ZRowParams, body: ZRowComment }, async ({ actor, params, body }) =>
    Response.json(await commentOnRow(actor, params.projectId, sheet, params.itemId, body), { status: 201 }),
  );

export const rowWorkingRoute = (sheet: TCheckSheet) =>
  route({ roles: DRAFT_READERS, params: ZRowParams, query: ZWorkingQuery }, ({ actor, params, query }) => getRowWorking(actor, params.projectId, sheet, params.itemId, query.case));

export const rowHistoryRoute = (sheet: TCheckSheet) =>
  route({ roles: DRAFT_READERS, params: ZRowParams, query: ZHistoryQuery }, async ({ actor, params, query }) => {
    await findRowOrThrow(db(), actor.firm.id, params.projectId, sheet, params.itemId);
    return listProjectHistory(actor, params.projectId, { entityId: params.itemId, before: query.before, limit: query.limit });
  });

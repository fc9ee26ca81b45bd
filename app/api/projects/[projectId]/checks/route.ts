// GET: the check view of a project — every row's check state, the counts, the next unchecked row.
// POST: a checker accepts several rows at once, each at the version read (all or nothing).
import { ZAcceptRows, ZBoardQuery } from "@/schemas/checking";
import { ZProjectParams } from "@/schemas/project";
import { DRAFT_READERS } from "@/server/checking/roles";
import { route } from "@/server/http/route";
import { acceptRows } from "@/server/services/accept-rows";
import { getCheckBoard } from "@/server/services/get-check-board";

export const GET = route({ roles: DRAFT_READERS, params: ZProjectParams, query: ZBoardQuery }, ({ actor, params, query }) => getCheckBoard(actor, params.projectId, query));
export const POST = route({ roles: ["checker"], params: ZProjectParams, body: ZAcceptRows }, ({ actor, params, body }) => acceptRows(actor, params.projectId, body));

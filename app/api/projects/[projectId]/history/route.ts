// GET: a project's audit trail, newest first, a page at a time (?before=<id>&limit=…).
import { ZHistoryQuery } from "@/schemas/checking";
import { ZProjectParams } from "@/schemas/project";
import { DRAFT_READERS } from "@/server/checking/roles";
import { route } from "@/server/http/route";
import { listProjectHistory } from "@/server/services/list-project-history";

export const GET = route({ roles: DRAFT_READERS, params: ZProjectParams, query: ZHistoryQuery }, ({ actor, params, query }) => listProjectHistory(actor, params.projectId, query));

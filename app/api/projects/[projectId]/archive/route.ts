// /api/projects/:projectId/archive — POST {"version"} archives a project (read-only, listed
// apart, everything kept); DELETE ?version= brings it back. Firm admins only.
import { ZProjectArchive, ZProjectParams } from "@/schemas/project";
import { ZDeleteQuery } from "@/schemas/schedule";
import { route } from "@/server/http/route";
import { setProjectArchived } from "@/server/services/archive-project";

export const POST = route({ roles: ["admin"], params: ZProjectParams, body: ZProjectArchive }, ({ actor, params, body }) => setProjectArchived(actor, params.projectId, body.version, true));
export const DELETE = route({ roles: ["admin"], params: ZProjectParams, query: ZDeleteQuery }, ({ actor, params, query }) => setProjectArchived(actor, params.projectId, query.version, false));

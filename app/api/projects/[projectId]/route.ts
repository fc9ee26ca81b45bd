// /api/projects/:projectId — GET one project of the current firm (any member; 404 for any other
// firm's); PATCH its name, reference, site, units or default method with the version read, and
// DELETE ?version= it with its whole schedule (admins; never one with issued revisions: 409,
// archive it instead).
import { ZProjectParams, ZProjectUpdate } from "@/schemas/project";
import { ZDeleteQuery } from "@/schemas/schedule";
import { route } from "@/server/http/route";
import { deleteProject } from "@/server/services/delete-project";
import { getProjectOrThrow } from "@/server/services/get-project";
import { updateProject } from "@/server/services/update-project";

export const GET = route({ params: ZProjectParams }, ({ actor, params }) => getProjectOrThrow(actor, params.projectId));
export const PATCH = route({ roles: ["consultant"], params: ZProjectParams, body: ZProjectUpdate }, ({ actor, params, body }) => updateProject(actor, params.projectId, body));
export const DELETE = route({ roles: ["admin"], params: ZProjectParams, query: ZDeleteQuery }, ({ actor, params, query }) => deleteProject(actor, params.projectId, query.version));

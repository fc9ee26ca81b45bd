// GET /api/projects/:projectId: one project of the current firm; 404 for any other firm's.
import { ZProjectParams } from "@/schemas/project";
import { route } from "@/server/http/route";
import { getProjectOrThrow } from "@/server/services/get-project";

export const GET = route({ params: ZProjectParams }, ({ actor, params }) => getProjectOrThrow(actor, params.projectId));

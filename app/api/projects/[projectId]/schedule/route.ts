// GET /api/projects/:projectId/schedule: the whole schedule — project and site, design cases,
// zones, build-ups with layers, surfaces and duct runs — in one read (any member).
import { ZProjectParams } from "@/schemas/project";
import { route } from "@/server/http/route";
import { getScheduleOrThrow } from "@/server/services/get-schedule";

export const GET = route({ params: ZProjectParams }, ({ actor, params }) => getScheduleOrThrow(actor, params.projectId));

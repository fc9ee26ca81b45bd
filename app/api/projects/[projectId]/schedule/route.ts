// GET /api/projects/:projectId/schedule: the whole schedule — project and site, design cases,
// zones, build-ups with layers, surfaces and duct runs — in one read (consultants,
// checkers and admins: viewers read issued revisions only).
import { ZProjectParams } from "@/schemas/project";
import { DRAFT_READERS } from "@/server/checking/roles";
import { route } from "@/server/http/route";
import { getScheduleOrThrow } from "@/server/services/get-schedule";

export const GET = route({ roles: DRAFT_READERS, params: ZProjectParams }, ({ actor, params }) => getScheduleOrThrow(actor, params.projectId));

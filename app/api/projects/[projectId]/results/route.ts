// GET /api/projects/:projectId/results?case=<design case id>: every row's results and the zone
// totals for that design case, computed here by the engine (consultants, checkers and
// admins: viewers read issued revisions only).
import { z } from "zod";
import { ZProjectParams } from "@/schemas/project";
import { DRAFT_READERS } from "@/server/checking/roles";
import { route } from "@/server/http/route";
import { getScheduleResults } from "@/server/services/get-schedule-results";

const ZQuery = z.object({ case: z.uuid({ error: "case must be the id of one of the project's design cases" }) });

export const GET = route({ roles: DRAFT_READERS, params: ZProjectParams, query: ZQuery }, ({ actor, params, query }) => getScheduleResults(actor, params.projectId, query.case));

// GET: how far a report's build has got (status, progress 0…1, stage) and, once done, where to
// download it. Drafts: admins, consultants, checkers; a revision's build: everyone in the firm.
import { ZReportBuildParams } from "@/schemas/reports";
import { route } from "@/server/http/route";
import { getReportBuild } from "@/server/services/get-report-build";

export const GET = route({ params: ZReportBuildParams }, async ({ actor, params }) => getReportBuild(actor, params.projectId, params.buildId));

// POST {"kind":"draft"}: queue a draft calculation report; 202 with the build to follow, or 200
// with the draft already queued or running for this project (one at a time); 413 over the size
// limit (admins, consultants and checkers; viewers read issued revisions only).
import { ZProjectParams } from "@/schemas/project";
import { ZReportRequest } from "@/schemas/reports";
import { route } from "@/server/http/route";
import { requestDraftReport } from "@/server/services/request-draft-report";

export const POST = route({ roles: ["admin", "consultant", "checker"], params: ZProjectParams, body: ZReportRequest }, async ({ actor, params }) => {
  const { build, existing } = await requestDraftReport(actor, params.projectId);
  return Response.json(build, { status: existing ? 200 : 202 });
});

// GET /api/projects/:projectId/report: the draft calculation report (PDF) of the schedule as it
// stands, watermarked "not for issue" (admins, consultants and checkers; viewers read issued
// revisions only).
import { ZProjectParams } from "@/schemas/project";
import { pdfResponse } from "@/server/http/pdf-response";
import { route } from "@/server/http/route";
import { buildProjectReport } from "@/server/services/build-project-report";

export const GET = route({ roles: ["admin", "consultant", "checker"], params: ZProjectParams }, async ({ actor, params }) => {
  const r = await buildProjectReport(actor, params.projectId);
  return pdfResponse(r);
});

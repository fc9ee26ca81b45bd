// POST {"kind":"draft"}: queue a draft calculation report; 202 with the build to follow
// (admins, consultants and checkers; viewers read issued revisions only).
import { ZProjectParams } from "@/schemas/project";
import { ZReportRequest } from "@/schemas/reports";
import { route } from "@/server/http/route";
import { requestDraftReport } from "@/server/services/request-draft-report";

export const POST = route({ roles: ["admin", "consultant", "checker"], params: ZProjectParams, body: ZReportRequest }, async ({ actor, params }) =>
  Response.json(await requestDraftReport(actor, params.projectId), { status: 202 }),
);

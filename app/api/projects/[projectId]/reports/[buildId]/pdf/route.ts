// GET: the PDF of a finished report build (409 while it is still being built).
import { ZReportBuildParams } from "@/schemas/reports";
import { pdfResponse } from "@/server/http/pdf-response";
import { route } from "@/server/http/route";
import { getReportBuildPdf } from "@/server/services/get-report-build";

export const GET = route({ params: ZReportBuildParams }, async ({ actor, params }) => pdfResponse(await getReportBuildPdf(actor, params.projectId, params.buildId)));

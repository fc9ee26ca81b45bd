// GET: the calculation report (PDF) of an issued revision, stored with it as first built and
// never changed (everyone in the firm, viewers included: it is what was issued).
import { ZRevisionParams } from "@/schemas/checking";
import { pdfResponse } from "@/server/http/pdf-response";
import { route } from "@/server/http/route";
import { getRevisionReport } from "@/server/services/build-revision-report";

export const GET = route({ params: ZRevisionParams }, async ({ actor, params }) => pdfResponse(await getRevisionReport(actor, params.projectId, params.letter)));

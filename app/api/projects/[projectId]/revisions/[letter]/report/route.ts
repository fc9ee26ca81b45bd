// GET: the calculation report (PDF) of an issued revision, from its frozen snapshot (everyone in
// the firm, viewers included: it is what was issued).
import { ZRevisionParams } from "@/schemas/checking";
import { pdfResponse } from "@/server/http/pdf-response";
import { route } from "@/server/http/route";
import { buildRevisionReport } from "@/server/services/build-revision-report";

export const GET = route({ params: ZRevisionParams }, async ({ actor, params }) => {
  const r = await buildRevisionReport(actor, params.projectId, params.letter);
  return pdfResponse(r);
});

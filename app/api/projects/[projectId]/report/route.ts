// GET /api/projects/:projectId/report: the draft calculation report (PDF) of the schedule as it
// stands, watermarked "not for issue" (admins, consultants and checkers; viewers read issued
// revisions only).
import { ZProjectParams } from "@/schemas/project";
import { route } from "@/server/http/route";
import { buildProjectReport } from "@/server/services/build-project-report";

export const GET = route({ roles: ["admin", "consultant", "checker"], params: ZProjectParams }, async ({ actor, params }) => {
  const r = await buildProjectReport(actor, params.projectId);
  return new Response(new Blob([r.pdf as Uint8Array<ArrayBuffer>], { type: "application/pdf" }), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="${r.filename}"`,
      "cache-control": "no-store",
      "x-report-pages": String(r.pages),
    },
  });
});

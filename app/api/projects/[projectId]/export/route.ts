// GET /api/projects/:projectId/export?format=csv|xlsx[&sheet=…][&template=1][&case=<id>]: the
// schedule (or a blank template) as a file in the project's units (consultants, checkers and admins:
// viewers read issued revisions only).
import { z } from "zod";
import { ZProjectParams } from "@/schemas/project";
import { ZSheet } from "@/schemas/schedule";
import { DRAFT_READERS } from "@/server/checking/roles";
import { route } from "@/server/http/route";
import { exportSchedule } from "@/server/services/export-schedule";

const ZQuery = z.object({
  format: z.enum(["csv", "xlsx"], { error: "format must be csv or xlsx" }),
  sheet: ZSheet.optional(),
  template: z.enum(["0", "1"]).default("0"),
  case: z.uuid({ error: "case must be the id of one of the project's design cases" }).optional(),
});

export const GET = route({ roles: DRAFT_READERS, params: ZProjectParams, query: ZQuery }, async ({ actor, params, query }) => {
  const file = await exportSchedule(actor, params.projectId, { format: query.format, sheet: query.sheet, template: query.template === "1", caseId: query.case });
  return new Response(file.body, {
    headers: { "content-type": file.contentType, "content-disposition": `attachment; filename="${file.filename}"`, "cache-control": "no-store" },
  });
});

// POST /api/projects/:projectId/import?sheet=surfaces|duct_runs&mode=append|replace[&format=csv|xlsx]
// with the file as the body (consultant). One transaction: a single bad row saves nothing and the
// 422 lists every problem by row, column and message.
import { z } from "zod";
import { ZProjectParams } from "@/schemas/project";
import { ZSheet } from "@/schemas/schedule";
import { readBytes } from "@/server/http/read-bytes";
import { route } from "@/server/http/route";
import { importSchedule } from "@/server/services/import-schedule";

const ZQuery = z.object({
  sheet: ZSheet.optional(),
  mode: z.enum(["append", "replace"], { error: "mode must be append or replace" }).default("append"),
  format: z.enum(["csv", "xlsx"], { error: "format must be csv or xlsx" }).optional(),
});
const MAX_UPLOAD_BYTES = 32 * 1024 * 1024;

export const POST = route({ roles: ["consultant"], params: ZProjectParams, query: ZQuery }, async ({ req, actor, params, query }) =>
  importSchedule(actor, params.projectId, { ...query, bytes: await readBytes(req, MAX_UPLOAD_BYTES), contentType: req.headers.get("content-type") }),
);

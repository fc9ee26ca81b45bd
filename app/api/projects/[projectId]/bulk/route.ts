// POST /api/projects/:projectId/bulk { changes: [{ op, sheet, id?, version?, values? }] }: many
// row changes in one transaction, all or nothing (consultant). 422 names each bad row and field;
// 409 lists each stale row with its current state.
import { ZBulkBody } from "@/schemas/bulk";
import { ZProjectParams } from "@/schemas/project";
import { route } from "@/server/http/route";
import { applyScheduleChanges } from "@/server/services/apply-schedule-changes";

export const POST = route({ roles: ["consultant"], params: ZProjectParams, body: ZBulkBody, maxBodyBytes: 16 * 1024 * 1024 }, ({ actor, params, body }) =>
  applyScheduleChanges(actor, params.projectId, body),
);

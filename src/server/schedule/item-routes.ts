import "server-only";
import { z } from "zod";
import { ZProjectParams } from "@/schemas/project";
import { ZDeleteQuery, ZItemParams, ZVersion } from "@/schemas/schedule";
import { DRAFT_READERS } from "@/server/checking/roles";
import { route } from "@/server/http/route";
import { createScheduleItem } from "@/server/services/create-schedule-item";
import { deleteScheduleItem } from "@/server/services/delete-schedule-item";
import { getScheduleItemOrThrow } from "@/server/services/get-schedule-item";
import { listScheduleItems } from "@/server/services/list-schedule-items";
import { updateScheduleItem } from "@/server/services/update-schedule-item";
import type { EntityName } from "./entities";

// The five item tables of a schedule share one set of handlers; the route files under
// app/api/projects/[projectId]/<table>/ stay one line per method. Consultants, checkers and
// admins read (viewers see issued revisions only); consultants write.
const EDITORS = ["consultant"] as const;
const ZValues = z.record(z.string(), z.unknown(), { error: "The body must be an object of fields" });
const ZPatch = z.looseObject({ version: ZVersion });

export const listItemsRoute = (name: EntityName) =>
  route({ roles: DRAFT_READERS, params: ZProjectParams }, async ({ actor, params }) => ({ items: await listScheduleItems(actor, params.projectId, name) }));

export const createItemRoute = (name: EntityName) =>
  route({ roles: EDITORS, params: ZProjectParams, body: ZValues }, async ({ actor, params, body }) =>
    Response.json(await createScheduleItem(actor, params.projectId, name, body), { status: 201 }),
  );

export const getItemRoute = (name: EntityName) =>
  route({ roles: DRAFT_READERS, params: ZItemParams }, ({ actor, params }) => getScheduleItemOrThrow(actor, params.projectId, name, params.itemId));

export const updateItemRoute = (name: EntityName) =>
  route({
    roles: EDITORS, params: ZItemParams, body: ZPatch,
    // Saved, though the connection went with the COMMIT's answer: the row as it now stands.
    ifCommitted: ({ actor, params }) => getScheduleItemOrThrow(actor, params.projectId, name, params.itemId),
  }, ({ actor, params, body }) => {
    const { version, ...values } = body;
    return updateScheduleItem(actor, params.projectId, name, params.itemId, version, values);
  });

export const deleteItemRoute = (name: EntityName) =>
  route({ roles: EDITORS, params: ZItemParams, query: ZDeleteQuery }, ({ actor, params, query }) =>
    deleteScheduleItem(actor, params.projectId, name, params.itemId, query.version),
  );

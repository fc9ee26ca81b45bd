// GET /api/projects/:projectId/zones: the project's zones (any member). POST: add one (consultant).
import { createItemRoute, listItemsRoute } from "@/server/schedule/item-routes";

export const GET = listItemsRoute("zones");
export const POST = createItemRoute("zones");

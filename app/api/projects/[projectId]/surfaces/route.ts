// GET /api/projects/:projectId/surfaces: the project's surfaces (any member). POST: add one (consultant).
import { createItemRoute, listItemsRoute } from "@/server/schedule/item-routes";

export const GET = listItemsRoute("surfaces");
export const POST = createItemRoute("surfaces");

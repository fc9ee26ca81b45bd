// GET /api/projects/:projectId/buildups: the project's build-ups (any member). POST: add one (consultant).
import { createItemRoute, listItemsRoute } from "@/server/schedule/item-routes";

export const GET = listItemsRoute("buildups");
export const POST = createItemRoute("buildups");

// GET /api/projects/:projectId/duct-runs: the project's duct runs (any member). POST: add one (consultant).
import { createItemRoute, listItemsRoute } from "@/server/schedule/item-routes";

export const GET = listItemsRoute("duct_runs");
export const POST = createItemRoute("duct_runs");

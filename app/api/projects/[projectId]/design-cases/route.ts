// GET /api/projects/:projectId/design-cases: the project's design cases (any member). POST: add one (consultant).
import { createItemRoute, listItemsRoute } from "@/server/schedule/item-routes";

export const GET = listItemsRoute("design_cases");
export const POST = createItemRoute("design_cases");

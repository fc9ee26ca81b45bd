// /api/projects/:projectId/design-cases/:itemId — GET one (any member); PATCH { version, …fields } and
// DELETE ?version= (consultant): a stale version answers 409 with the row as it stands.
import { deleteItemRoute, getItemRoute, updateItemRoute } from "@/server/schedule/item-routes";

export const GET = getItemRoute("design_cases");
export const PATCH = updateItemRoute("design_cases");
export const DELETE = deleteItemRoute("design_cases");

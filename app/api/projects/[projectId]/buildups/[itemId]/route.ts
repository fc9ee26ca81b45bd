// /api/projects/:projectId/buildups/:itemId — GET one (any member); PATCH { version, …fields } and
// DELETE ?version= (consultant): a stale version answers 409 with the row as it stands.
import { deleteItemRoute, getItemRoute, updateItemRoute } from "@/server/schedule/item-routes";

export const GET = getItemRoute("buildups");
export const PATCH = updateItemRoute("buildups");
export const DELETE = deleteItemRoute("buildups");

// /api/projects/:projectId/surfaces/:itemId — GET one (any member); PATCH { version, …fields } and
// DELETE ?version= (consultant): a stale version answers 409 with the row as it stands.
import { deleteItemRoute, getItemRoute, updateItemRoute } from "@/server/schedule/item-routes";

export const GET = getItemRoute("surfaces");
export const PATCH = updateItemRoute("surfaces");
export const DELETE = deleteItemRoute("surfaces");

// /api/projects/:projectId/zones/:itemId — GET one (any member); PATCH { version, …fields } and
// DELETE ?version= (consultant): a stale version answers 409 with the row as it stands.
import { deleteItemRoute, getItemRoute, updateItemRoute } from "@/server/schedule/item-routes";

export const GET = getItemRoute("zones");
export const PATCH = updateItemRoute("zones");
export const DELETE = deleteItemRoute("zones");

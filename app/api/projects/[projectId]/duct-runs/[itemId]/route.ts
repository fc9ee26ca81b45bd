// /api/projects/:projectId/duct-runs/:itemId — GET one (any member); PATCH { version, …fields } and
// DELETE ?version= (consultant): a stale version answers 409 with the row as it stands.
import { deleteItemRoute, getItemRoute, updateItemRoute } from "@/server/schedule/item-routes";

export const GET = getItemRoute("duct_runs");
export const PATCH = updateItemRoute("duct_runs");
export const DELETE = deleteItemRoute("duct_runs");

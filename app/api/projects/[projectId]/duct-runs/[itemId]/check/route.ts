// POST: a checker accepts or queries one duct run at the version they read.
import { checkRowRoute } from "@/server/checking/row-routes";

export const POST = checkRowRoute("duct_runs");

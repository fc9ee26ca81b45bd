// POST: a checker accepts or queries one surface at the version they read.
import { checkRowRoute } from "@/server/checking/row-routes";

export const POST = checkRowRoute("surfaces");

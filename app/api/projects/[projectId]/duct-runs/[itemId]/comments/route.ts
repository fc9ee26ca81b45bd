// The thread of one duct run: GET reads it (not viewers), POST adds to it (consultants and checkers).
import { addCommentRoute, listCommentsRoute } from "@/server/checking/row-routes";

export const GET = listCommentsRoute("duct_runs");
export const POST = addCommentRoute("duct_runs");

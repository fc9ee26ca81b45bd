// The thread of one surface: GET reads it (not viewers), POST adds to it (consultants and checkers).
import { addCommentRoute, listCommentsRoute } from "@/server/checking/row-routes";

export const GET = listCommentsRoute("surfaces");
export const POST = addCommentRoute("surfaces");

// GET: the working of one surface for a design case (?case=…), with its check state and thread.
import { rowWorkingRoute } from "@/server/checking/row-routes";

export const GET = rowWorkingRoute("surfaces");

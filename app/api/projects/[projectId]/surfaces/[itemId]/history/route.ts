// GET: the audit trail of one surface — edits, check moves and comments — newest first.
import { rowHistoryRoute } from "@/server/checking/row-routes";

export const GET = rowHistoryRoute("surfaces");

import "server-only";
import { nextCheckState, refusedMoveReason, type TCheckMove, type TCheckSheet, type TCheckState } from "@/checking/check-machine";
import type { RowCheck, ScheduleRowRef } from "@/server/repositories/row-checks";
import { SHEET_NOUN } from "@/server/repositories/row-checks";

export type CheckRefusal = { status: "conflict" | "forbidden"; field: string; message: string };

/**
 * Whether `userId` may make `move` on a row read at `readVersion`, given its stored check: the
 * rules every check goes through, one at a time or many at once. Null when allowed.
 */
export function checkRefusal(sheet: TCheckSheet, row: ScheduleRowRef, check: RowCheck | null, userId: number, move: TCheckMove, readVersion: number): CheckRefusal | null {
  const noun = SHEET_NOUN[sheet];
  if (row.version !== readVersion) {
    return { status: "conflict", field: "row_version", message: `This ${noun} changed since you read it (now version ${row.version}); read its working again before checking it` };
  }
  if (check?.last_edited_by === userId) return { status: "forbidden", field: "move", message: `You last edited this ${noun}, so another checker must check it` };
  const state: TCheckState = check?.state ?? "unchecked";
  if (nextCheckState(move, state) === null) return { status: "conflict", field: "move", message: refusedMoveReason(move, state) };
  return null;
}

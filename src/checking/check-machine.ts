/**
 * The check state of a schedule row and the moves a checker may make. Pure data and functions,
 * shared by the server (which enforces them) and the pages (which offer only allowed moves).
 *
 *   unchecked ──accept──▶ accepted        any change to the row ──▶ unchecked
 *   unchecked ──query───▶ queried         (from every state; see the schedule's write hooks)
 *   queried   ──accept──▶ accepted
 *   accepted  ──query───▶ queried
 */
export const CHECK_STATES = ["unchecked", "accepted", "queried"] as const;
export type TCheckState = (typeof CHECK_STATES)[number];

export const CHECK_SHEETS = ["surfaces", "duct_runs"] as const;
export type TCheckSheet = (typeof CHECK_SHEETS)[number];

export type TCheckMove = "accept" | "query";

export const CHECK_MOVES: Record<TCheckMove, { from: readonly TCheckState[]; to: TCheckState }> = {
  accept: { from: ["unchecked", "queried"], to: "accepted" },
  // A second query on a queried row is a comment in its thread, not a new state.
  query: { from: ["unchecked", "accepted"], to: "queried" },
};

export const STATE_LABELS: Record<TCheckState, string> = { unchecked: "Unchecked", accepted: "Accepted", queried: "Queried" };
export const SHEET_LABELS: Record<TCheckSheet, string> = { surfaces: "Surface", duct_runs: "Duct run" };

/** The state a move leads to, or null when the move is not allowed from `state`. */
export function nextCheckState(move: TCheckMove, state: TCheckState): TCheckState | null {
  const m = CHECK_MOVES[move];
  return m.from.includes(state) ? m.to : null;
}

/** Why a move is refused from a state, in words for the checker. */
export function refusedMoveReason(move: TCheckMove, state: TCheckState): string {
  if (move === "accept") return "This row is already accepted";
  return state === "queried" ? "This row is already queried: add to its thread instead" : `A ${state} row cannot be queried`;
}

import { STATE_LABELS, type TCheckState } from "@/checking/check-machine";

const TONES: Record<TCheckState, string> = {
  unchecked: "border-line bg-sunken text-muted",
  accepted: "border-ok/40 bg-ok/10 text-ok",
  queried: "border-danger/40 bg-danger/10 text-danger",
};
const MARKS: Record<TCheckState, string> = { unchecked: "○", accepted: "✓", queried: "?" };

/** A row's check state as a small labelled chip (the mark repeats the word for colour-blind readers). */
export function StateBadge({ state }: { state: TCheckState }) {
  return (
    <span className={`inline-flex items-center gap-1 rounded-chip border px-2 py-0.5 text-micro font-semibold ${TONES[state]}`} data-state={state}>
      <span aria-hidden>{MARKS[state]}</span>
      {STATE_LABELS[state]}
    </span>
  );
}

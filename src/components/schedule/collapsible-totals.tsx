"use client";

import type { ReactNode } from "react";

/**
 * The zone totals beside the grid (below it under 1536 px, where the panel lays its table and
 * chart side by side), folded to a narrow strip on request: the strip gives the grid the room
 * back and still says what is folded there. `--fs-fill-h` (set by the page) is the grid's height. The choice is the person's
 * (saved with their view settings by the caller). The panel itself is not rendered while
 * folded, so an edit does not repaint it.
 */
export function CollapsibleTotals({ collapsed, onToggle, children }: { collapsed: boolean; onToggle: (collapsed: boolean) => void; children: ReactNode }) {
  if (collapsed) {
    return (
      <div className="flex shrink-0 2xl:h-[var(--fs-fill-h)] 2xl:w-10">
        <button
          type="button"
          aria-expanded="false"
          aria-controls="zone-totals"
          onClick={() => onToggle(false)}
          title="Show the zone totals"
          className="flex w-full items-center justify-center gap-2 rounded-panel border border-line bg-surface px-2 py-2 text-small font-semibold text-muted shadow-panel hover:bg-sunken hover:text-ink 2xl:flex-col 2xl:justify-start 2xl:py-3"
        >
          <span className="2xl:[writing-mode:vertical-rl]">Zone totals</span>
        </button>
      </div>
    );
  }
  return (
    // Below the grid (under 1536 px) the panel starts off screen: the browser skips its layout and
    // paint until it is scrolled into view (content-visibility), so an edit's frame does not pay for it.
    <div id="zone-totals" className="relative min-w-0 [contain-intrinsic-size:auto_40rem] [content-visibility:auto] 2xl:h-[var(--fs-fill-h)] 2xl:w-[20rem] 2xl:shrink-0 2xl:overflow-y-auto">
      <button
        type="button"
        aria-expanded="true"
        aria-controls="zone-totals"
        onClick={() => onToggle(true)}
        title="Fold the zone totals to a strip: the grid gets the width"
        className="absolute right-2 top-2 z-[1] rounded-chip border border-line bg-surface px-2 py-0.5 text-small font-semibold text-muted hover:bg-sunken hover:text-ink"
      >
        Fold<span className="sr-only"> zone totals</span>
      </button>
      {children}
    </div>
  );
}

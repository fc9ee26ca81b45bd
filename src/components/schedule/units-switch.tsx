"use client";

import { UNIT_SYSTEMS, type UnitSystem } from "@/units/units";
import { useProject } from "./schedule-context";

/**
 * SI or IP: each person's own view, saved with their settings. Switching changes nothing in the
 * project (no history, no row marked as edited); the project's own units, set under "Site and
 * units", stay the default for anyone who has not chosen and the units of its reports and exports.
 */
export function UnitsSwitch() {
  const { system, projectSystem, setSystem } = useProject();
  const choose = (s: UnitSystem) => {
    if (s !== system) setSystem(s);
  };
  const hint = `Your view only. The project's units (${projectSystem}) are the default for anyone who has not chosen, and the units of its reports and exports.`;
  return (
    <div className="grid gap-0.5 text-micro font-medium text-muted">
      <span>
        <span id="units-label">Your units</span>
        {/* Said where it matters: what this person sees is not what the project's reports print. */}
        {system !== projectSystem ? <span className="font-normal"> · project and reports in {projectSystem}</span> : null}
      </span>
      <div role="radiogroup" aria-labelledby="units-label" aria-describedby="units-hint" title={hint} className="inline-flex rounded-chip border border-line bg-canvas p-0.5 text-small">
        {UNIT_SYSTEMS.map((s) => (
          <button
            key={s}
            type="button"
            role="radio"
            aria-checked={system === s}
            onClick={() => choose(s)}
            className="rounded-[0.3rem] px-2.5 py-1 font-medium text-muted aria-checked:bg-accent aria-checked:text-accent-ink"
          >
            {s}
          </button>
        ))}
      </div>
      <span id="units-hint" className="sr-only">
        {hint}
      </span>
    </div>
  );
}

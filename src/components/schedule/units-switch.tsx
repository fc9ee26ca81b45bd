"use client";

import { UNIT_SYSTEMS, type UnitSystem } from "@/units/units";
import { useProject } from "./schedule-context";
import { useScheduleWrites } from "./use-schedule-writes";

/**
 * SI or IP. For a consultant the choice is the project's and is saved; anyone else switches only
 * what they see (the project's units stay as its consultants set them).
 */
export function UnitsSwitch() {
  const { system, setSystem, canEdit, notify } = useProject();
  const { project } = useScheduleWrites();
  const choose = (s: UnitSystem) => {
    if (s === system) return;
    if (!canEdit) return setSystem(s);
    setSystem(null);
    project.mutate({ unit_system: s }, { onError: (e) => notify({ tone: "error", message: `Units not changed: ${e.message}` }) });
  };
  return (
    <div role="radiogroup" aria-label="Units" className="inline-flex rounded-chip border border-line bg-canvas p-0.5 text-small">
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
  );
}

"use client";

import { ORIENTATIONS } from "@/calc/index";
import { CASE_KIND_OPTIONS, DESIGN_CASE_NUMBERS, SOLAR_SPEC } from "@/schemas/schedule-fields";
import type { TDesignCase } from "@/schemas/schedule";
import { ItemEditor, type Extra } from "@/components/forms/item-editor";
import { readFields, shownValue, type FieldDef } from "@/components/forms/item-form";
import { useSchedule } from "@/components/schedule/schedule-context";
import { unitLabel } from "@/units/units";

// What the case's kind takes from the zones and duct runs (src/calc/schedule/cases.ts).
const KIND_HINTS: Record<string, string> = {
  heating: "Zones at their heating set points, ducts at their heating entering air; usually no sun.",
  cooling: "Zones at their cooling set points, ducts at their cooling entering air and surround; sun below.",
};

const FIELDS: FieldDef[] = [
  { name: "name", label: "Name", kind: "text" },
  { name: "kind", label: "Kind", kind: "select", options: CASE_KIND_OPTIONS, hint: (kind) => KIND_HINTS[kind] ?? "" },
  ...Object.entries(DESIGN_CASE_NUMBERS).map(([name, spec]): FieldDef => ({ name, label: spec.label, kind: "number", spec, ...("hint" in spec ? { hint: spec.hint } : {}) })),
];
// A new case starts under a clear sky, as the engine assumes when no cloud cover is given.
const NEW_CASE = { cloud_cover: 0 };
const FACES = [...ORIENTATIONS, "horizontal"] as const;
const solarField = (o: string): FieldDef => ({ name: `solar_${o}`, label: o === "horizontal" ? "Horizontal" : o, kind: "number", spec: { ...SOLAR_SPEC, label: `Solar irradiance ${o}`, blank: "0" } });

/** The solar table: irradiance on vertical faces by orientation and on a horizontal one. */
const SOLAR: Extra = {
  render: (values, errors, disabled, system) => {
    const table = (values.solar_W_m2 ?? {}) as Record<string, number>;
    return (
      <fieldset className="grid gap-2">
        <legend className="text-micro font-medium text-muted">Solar irradiance on the faces ({unitLabel("heat_flux", system)}); blank = none.</legend>
        <div className="grid grid-cols-3 gap-2 sm:grid-cols-5 lg:grid-cols-9">
          {FACES.map((o) => {
            const f = solarField(o);
            return (
              <label key={o} className="grid gap-0.5 text-micro text-muted">
                {f.label}
                <input
                  name={f.name}
                  defaultValue={shownValue(f, table[o], system)}
                  inputMode="decimal"
                  disabled={disabled}
                  aria-invalid={errors[f.name] ? true : undefined}
                  className="w-full rounded-chip border border-line bg-canvas px-2 py-1 text-small text-ink aria-[invalid=true]:border-danger"
                />
                {errors[f.name] ? <span className="text-danger">{errors[f.name]}</span> : null}
              </label>
            );
          })}
        </div>
      </fieldset>
    );
  },
  read: (form, system) => {
    const { values, errors } = readFields(FACES.map(solarField), form, system);
    const solar = Object.fromEntries(FACES.filter((o) => values[`solar_${o}`] !== null).map((o) => [o, values[`solar_${o}`]]));
    return { values: { solar_W_m2: solar }, errors };
  },
};

export function DesignCasesView() {
  const s = useSchedule();
  return (
    <div className="grid gap-4">
      <p className="max-w-prose text-small text-muted">
        Each design case is one set of outdoor conditions. The wind is read at a 10 m met mast in open country and carried to each surface&apos;s height by the site&apos;s terrain and wind law.
      </p>
      {s.design_cases.map((dc: TDesignCase) => (
        <ItemEditor key={dc.id} table="design_cases" item={dc as never} fields={FIELDS} extra={SOLAR} title={dc.name} noun="Design case" gridClass="sm:grid-cols-3 lg:grid-cols-6" />
      ))}
      <ItemEditor table="design_cases" item={null} initial={NEW_CASE} fields={FIELDS} extra={SOLAR} title="New design case" noun="Design case" gridClass="sm:grid-cols-3 lg:grid-cols-6" />
    </div>
  );
}

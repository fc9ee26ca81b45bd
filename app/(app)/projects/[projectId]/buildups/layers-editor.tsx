"use client";

import { useState } from "react";
import { buildupResistance } from "@/calc/index";
import { LAYER_NUMBERS } from "@/schemas/schedule-fields";
import type { TLayer } from "@/schemas/schedule";
import { readFields, shownValue, type FieldDef, type FieldErrors } from "@/components/forms/item-form";
import { formatQuantity } from "@/units/format";
import { unitLabel, type UnitSystem } from "@/units/units";

const LAYER_FIELDS: FieldDef[] = [
  { name: "material", label: "Material", kind: "text" },
  { name: "thickness_m", label: "Thickness", kind: "number", spec: LAYER_NUMBERS.thickness_m },
  { name: "k_W_mK", label: "Conductivity", kind: "number", spec: LAYER_NUMBERS.k_W_mK },
];

/** Reads the layer rows of a build-up form (inputs named layer-<i>-<field>). */
export function readLayers(form: FormData, system: UnitSystem): { values: { layers: TLayer[] }; errors: FieldErrors } {
  const count = Number(form.get("layer-count") ?? 0);
  const layers: TLayer[] = [];
  const errors: FieldErrors = {};
  for (let i = 0; i < count; i++) {
    const { values, errors: e } = readFields(LAYER_FIELDS, form, system, `layer-${i}-`);
    if (!String(values.material)) e.material = "Material is required";
    for (const [k, m] of Object.entries(e)) errors[`layers.${i}.${k}`] = `Layer ${i + 1}: ${m}`;
    layers.push(values as unknown as TLayer);
  }
  return { values: { layers }, errors };
}

/** The layers of a build-up, outside to inside, with the construction R they add up to. */
export function LayersEditor({ initial, errors, disabled, system }: { initial: TLayer[]; errors: FieldErrors; disabled: boolean; system: UnitSystem }) {
  const [rows, setRows] = useState<(TLayer & { key: number })[]>(() => initial.map((l, i) => ({ ...l, key: i })));
  const R = buildupResistance({ layers: initial, R_direct_m2K_W: null });
  const problems = Object.entries(errors).filter(([k]) => k.startsWith("layers"));
  const cell = "w-full rounded-chip border border-line bg-canvas px-2 py-1 text-small";
  return (
    <fieldset className="grid gap-2">
      <legend className="text-micro font-medium text-muted">Layers, outside to inside (surface resistances are added by the calculation; a ventilated rainscreen&apos;s cladding is left out)</legend>
      <input type="hidden" name="layer-count" value={rows.length} />
      {rows.length ? (
        <table className="w-full text-small">
          <thead className="text-micro text-muted">
            <tr>
              <th className="text-left font-medium">Material</th>
              <th className="text-left font-medium">Thickness ({unitLabel("thickness", system)})</th>
              <th className="text-left font-medium">Conductivity ({unitLabel("conductivity", system)})</th>
              <th />
            </tr>
          </thead>
          <tbody>
            {rows.map((l, i) => (
              <tr key={l.key}>
                <td className="pr-2">
                  <input aria-label={`Layer ${i + 1} material`} name={`layer-${i}-material`} defaultValue={l.material} disabled={disabled} className={cell} />
                </td>
                <td className="pr-2">
                  <input aria-label={`Layer ${i + 1} thickness`} name={`layer-${i}-thickness_m`} defaultValue={shownValue(LAYER_FIELDS[1]!, l.thickness_m, system)} inputMode="decimal" disabled={disabled} className={cell} />
                </td>
                <td className="pr-2">
                  <input aria-label={`Layer ${i + 1} conductivity`} name={`layer-${i}-k_W_mK`} defaultValue={shownValue(LAYER_FIELDS[2]!, l.k_W_mK, system)} inputMode="decimal" disabled={disabled} className={cell} />
                </td>
                <td>
                  {disabled ? null : (
                    <button type="button" aria-label={`Remove layer ${i + 1}`} onClick={() => setRows((r) => r.filter((x) => x.key !== l.key))} className="rounded-chip px-2 text-muted hover:bg-sunken">
                      ✕
                    </button>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : (
        <p className="text-small text-muted">No layers: the build-up uses its direct R.</p>
      )}
      {problems.map(([k, m]) => (
        <p key={k} className="text-micro text-danger">
          {m}
        </p>
      ))}
      <div className="flex items-center justify-between gap-2">
        {disabled ? <span /> : (
          <button type="button" onClick={() => setRows((r) => [...r, { material: "", thickness_m: 0.1, k_W_mK: 0.04, key: Date.now() }])} className="rounded-chip border border-line px-2 py-1 text-small hover:bg-sunken">
            Add layer
          </button>
        )}
        {initial.length ? <span className="text-small text-muted">Construction R (saved layers): {formatQuantity("resistance", R, system, 3)} {unitLabel("resistance", system)}</span> : null}
      </div>
    </fieldset>
  );
}

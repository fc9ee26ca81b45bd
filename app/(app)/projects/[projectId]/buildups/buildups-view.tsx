"use client";

import { BUILDUP_NUMBERS } from "@/schemas/schedule-fields";
import type { TLayer } from "@/schemas/schedule";
import { ItemEditor, type Extra } from "@/components/forms/item-editor";
import type { FieldDef } from "@/components/forms/item-form";
import { useSchedule } from "@/components/schedule/schedule-context";
import { LayersEditor, readLayers } from "./layers-editor";

const FIELDS: FieldDef[] = [
  { name: "name", label: "Name", kind: "text" },
  ...Object.entries(BUILDUP_NUMBERS).map(([name, spec]): FieldDef => ({ name, label: spec.label, kind: "number", spec, hint: name === "R_direct_m2K_W" ? "Only without layers" : undefined })),
];
const LAYERS: Extra = {
  render: (values, errors, disabled, system) => <LayersEditor initial={(values.layers as TLayer[]) ?? []} errors={errors} disabled={disabled} system={system} />,
  read: readLayers,
};

export function BuildupsView() {
  const s = useSchedule();
  return (
    <div className="grid gap-4">
      <p className="max-w-prose text-small text-muted">A build-up is a construction by its layers (R = Σ thickness / conductivity) or by a direct R, with the outside face&apos;s solar absorptance and long-wave emissivity. A surface row may override both.</p>
      {s.buildups.map((b) => (
        <ItemEditor key={b.id} table="buildups" item={b as never} fields={FIELDS} extra={LAYERS} title={b.name} noun="Build-up" gridClass="sm:grid-cols-4" />
      ))}
      <ItemEditor table="buildups" item={null} fields={FIELDS} extra={LAYERS} title="New build-up" noun="Build-up" gridClass="sm:grid-cols-4" />
    </div>
  );
}

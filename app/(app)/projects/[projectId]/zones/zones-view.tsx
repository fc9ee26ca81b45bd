"use client";

import { ZONE_NUMBERS } from "@/schemas/schedule-fields";
import { ItemEditor } from "@/components/forms/item-editor";
import type { FieldDef } from "@/components/forms/item-form";
import { useSchedule } from "@/components/schedule/schedule-context";

const FIELDS: FieldDef[] = [{ name: "name", label: "Name", kind: "text" }, ...Object.entries(ZONE_NUMBERS).map(([name, spec]): FieldDef => ({ name, label: spec.label, kind: "number", spec }))];

export function ZonesView() {
  const s = useSchedule();
  const used = (id: string) => s.surfaces.filter((r) => r.zone_id === id).length + s.duct_runs.filter((r) => r.zone_id === id).length;
  return (
    <div className="grid gap-4">
      <p className="max-w-prose text-small text-muted">Zones gather rows for the totals; their set points are the inside temperatures of the heating and cooling cases, and their RH is the air around ducts in their voids.</p>
      {s.zones.map((z) => (
        <ItemEditor key={z.id} table="zones" item={z as never} fields={FIELDS} title={<>{z.name} <span className="text-small font-normal text-muted">· {used(z.id)} rows</span></>} noun="Zone" gridClass="sm:grid-cols-5" />
      ))}
      <ItemEditor table="zones" item={null} fields={FIELDS} title="New zone" noun="Zone" gridClass="sm:grid-cols-5" />
    </div>
  );
}

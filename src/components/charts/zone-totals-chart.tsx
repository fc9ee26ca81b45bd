"use client";

import { memo } from "react";
import { Bar, BarChart, CartesianGrid, Legend, Tooltip, XAxis, YAxis } from "recharts";
import { formatShown } from "@/units/format";

export interface ZoneBar {
  zone: string;
  loss: number;
  gain: number;
}

/**
 * Heat loss and heat gain of each zone for one design case, side by side, in the person's units.
 * Loss in the cold colour, gain in the warm one, as in the grid.
 */
export const ZoneTotalsChart = memo(function ZoneTotalsChart({ data, unit }: { data: ZoneBar[]; unit: string }) {
  const fmt = (v: number) => formatShown(v, 0);
  return (
    <figure aria-label={`Heat loss and heat gain by zone, ${unit}`} className="grid gap-1">
      <BarChart responsive data={data} margin={{ top: 8, right: 8, bottom: 4, left: 8 }} style={{ width: "100%", height: 260 }}>
        <CartesianGrid stroke="var(--fs-line)" strokeDasharray="3 4" vertical={false} />
        <XAxis dataKey="zone" tick={{ fill: "var(--fs-muted)", fontSize: 11 }} interval={0} angle={-25} textAnchor="end" height={52} tickLine={false} axisLine={{ stroke: "var(--fs-line)" }} />
        <YAxis tickFormatter={fmt} tick={{ fill: "var(--fs-muted)", fontSize: 11 }} width={56} axisLine={false} tickLine={false} />
        <Tooltip
          formatter={(v) => `${fmt(Number(v))} ${unit}`}
          contentStyle={{ background: "var(--fs-surface)", border: "1px solid var(--fs-line)", borderRadius: 8, color: "var(--fs-ink)", fontSize: 12 }}
          cursor={{ fill: "var(--fs-sunken)", opacity: 0.6 }}
        />
        <Legend wrapperStyle={{ fontSize: 12, color: "var(--fs-muted)" }} />
        <Bar dataKey="loss" name="Heat loss" fill="var(--fs-frost)" radius={[4, 4, 0, 0]} isAnimationActive={false} />
        <Bar dataKey="gain" name="Heat gain" fill="var(--fs-heat)" radius={[4, 4, 0, 0]} isAnimationActive={false} />
      </BarChart>
      <figcaption className="text-micro text-muted">Per zone, {unit}: fabric and distribution; ducts inside the zone they serve are not counted.</figcaption>
    </figure>
  );
});

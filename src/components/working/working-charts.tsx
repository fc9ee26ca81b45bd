"use client";

import { CartesianGrid, Legend, Line, LineChart, ReferenceDot, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { WorkingCharts as Charts } from "@/calc/index";

const AXIS = { stroke: "var(--fs-muted)", fontSize: 11 };

/** Local h along the surface (laminar part falling as x^−½, the jump at transition). */
export function LocalHChart({ charts }: { charts: Charts }) {
  const pts = charts.local_h;
  if (pts === null || pts.length === 0) return <p className="text-small text-muted">No wind over this surface: no forced boundary layer to plot.</p>;
  const data = pts.map((p) => ({ x: Number(p.x_m.toPrecision(4)), laminar: p.regime === "laminar" ? p.h_W_m2K : null, turbulent: p.regime === "turbulent" ? p.h_W_m2K : null }));
  return (
    <figure aria-label="Local film coefficient along the surface" className="h-60">
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ top: 8, right: 16, bottom: 16, left: 0 }}>
          <CartesianGrid stroke="var(--fs-line)" />
          <XAxis dataKey="x" type="number" tick={AXIS} label={{ value: "distance from the leading edge x, m", position: "insideBottom", offset: -8, fontSize: 11 }} />
          <YAxis tick={AXIS} label={{ value: "h_x, W/m²K", angle: -90, position: "insideLeft", fontSize: 11 }} />
          <Tooltip />
          <Legend verticalAlign="top" height={24} wrapperStyle={{ fontSize: 12 }} />
          <Line dataKey="laminar" name="laminar" stroke="var(--fs-frost)" dot={false} connectNulls={false} isAnimationActive={false} />
          <Line dataKey="turbulent" name="turbulent" stroke="var(--fs-heat)" dot={false} connectNulls={false} isAnimationActive={false} />
        </LineChart>
      </ResponsiveContainer>
    </figure>
  );
}

/** Forced, natural and combined h against wind speed, with the row's own point marked. */
export function WindChart({ charts }: { charts: Charts }) {
  const pts = charts.h_vs_wind;
  if (pts === null) return null;
  return (
    <figure aria-label="Film coefficient against wind speed" className="h-60">
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={pts} margin={{ top: 8, right: 16, bottom: 16, left: 0 }}>
          <CartesianGrid stroke="var(--fs-line)" />
          <XAxis dataKey="V_m_s" type="number" tick={AXIS} label={{ value: "wind over the surface, m/s", position: "insideBottom", offset: -8, fontSize: 11 }} />
          <YAxis tick={AXIS} label={{ value: "h_c, W/m²K", angle: -90, position: "insideLeft", fontSize: 11 }} />
          <Tooltip />
          <Legend verticalAlign="top" height={24} wrapperStyle={{ fontSize: 12 }} />
          <Line dataKey="h_forced_W_m2K" name="forced" stroke="var(--fs-frost)" dot={false} isAnimationActive={false} />
          <Line dataKey="h_natural_W_m2K" name="natural" stroke="var(--fs-heat)" dot={false} isAnimationActive={false} />
          <Line dataKey="h_combined_W_m2K" name="combined" stroke="var(--fs-accent)" strokeWidth={2} dot={false} isAnimationActive={false} />
          {charts.current !== null && <ReferenceDot x={charts.current.V_m_s} y={charts.current.h_W_m2K} r={5} fill="var(--fs-accent)" stroke="var(--fs-surface)" />}
        </LineChart>
      </ResponsiveContainer>
    </figure>
  );
}

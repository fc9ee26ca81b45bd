"use client";

import { Bar, BarChart, CartesianGrid, Cell, Legend, Line, LineChart, ReferenceDot, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
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

const METHOD_LABELS: Record<string, string> = { boundary_layer: "Boundary layer", iso6946: "ISO 6946", mcadams: "McAdams" };

/** The method's name on the axis, and "chosen" beneath the one the row uses. */
function MethodTick(props: { x?: number | string; y?: number | string; payload?: { value: string }; chosen: string }) {
  const { x = 0, y = 0, payload, chosen } = props;
  return (
    <g transform={`translate(${x},${y})`}>
      <text textAnchor="middle" fontSize={11} fill="var(--fs-muted)">
        <tspan x={0} dy={12}>{payload?.value}</tspan>
        {payload?.value === chosen ? (
          <tspan x={0} dy={13} fontWeight={600} fill="var(--fs-ink)">
            chosen
          </tspan>
        ) : null}
      </text>
    </g>
  );
}

/**
 * h_o and Q of the same surface by the three exterior methods, the chosen one solid and labelled,
 * the others pale: how far the method choice moves the result. Q is drawn as a size (loss or
 * gain) when the three agree in sign, so both sets of bars grow up from zero.
 */
export function MethodSpreadChart({ charts }: { charts: Charts }) {
  const pts = charts.method_spread;
  if (pts === undefined || pts === null || pts.length === 0) return null;
  const allGain = pts.every((p) => p.Q_W < 0);
  const allLoss = pts.every((p) => p.Q_W >= 0);
  const qName = allGain ? "Heat gain (W)" : allLoss ? "Heat loss (W)" : "Q (W), positive a loss";
  const data = pts.map((p) => ({
    method: METHOD_LABELS[p.method] ?? p.method,
    h_o: Number(p.h_o_W_m2K.toPrecision(4)),
    Q: Math.round(allGain ? -p.Q_W : p.Q_W),
    chosen: p.chosen,
  }));
  const chosen = data.find((d) => d.chosen)?.method ?? "";
  return (
    <figure aria-label="Outside coefficient and heat flow by exterior method" className="grid gap-1" data-chart="method-spread">
      <div className="h-60">
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={data} margin={{ top: 8, right: 8, bottom: 4, left: 0 }} barGap={2}>
            <CartesianGrid stroke="var(--fs-line)" vertical={false} />
            <XAxis dataKey="method" interval={0} tickLine={false} height={36} tick={(t) => <MethodTick {...t} chosen={chosen} />} />
            <YAxis yAxisId="h" tick={AXIS} width={44} domain={[0, "auto"]} label={{ value: "h_o, W/m²K", angle: -90, position: "insideLeft", fontSize: 11 }} />
            <YAxis yAxisId="q" orientation="right" tick={AXIS} width={56} domain={[(m: number) => Math.min(0, m), (m: number) => Math.max(0, m)]} label={{ value: qName.replace(" (W)", ", W"), angle: 90, position: "insideRight", fontSize: 11 }} />
            <Tooltip contentStyle={{ background: "var(--fs-surface)", border: "1px solid var(--fs-line)", borderRadius: 8, color: "var(--fs-ink)", fontSize: 12 }} cursor={{ fill: "var(--fs-sunken)", opacity: 0.6 }} />
            <Legend verticalAlign="top" height={24} wrapperStyle={{ fontSize: 12 }} />
            <Bar yAxisId="h" dataKey="h_o" name="h_o (W/m²K)" fill="var(--fs-accent)" isAnimationActive={false}>
              {data.map((d) => (
                <Cell key={d.method} fill="var(--fs-accent)" fillOpacity={d.chosen ? 1 : 0.35} />
              ))}
            </Bar>
            <Bar yAxisId="q" dataKey="Q" name={qName} fill="var(--fs-heat)" isAnimationActive={false}>
              {data.map((d) => (
                <Cell key={d.method} fill="var(--fs-heat)" fillOpacity={d.chosen ? 1 : 0.35} />
              ))}
            </Bar>
          </BarChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="text-micro text-muted">The same surface and case by each exterior method; the chosen method solid and named, the others pale.</figcaption>
    </figure>
  );
}

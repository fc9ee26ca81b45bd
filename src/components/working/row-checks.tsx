import type { Working } from "@/calc/index";
import { formatNumber, type NumberRule } from "@/units/notation";
import { MethodSpreadChart } from "./working-charts";

const pick = (w: Working, section: string, symbol: string) => w.lines.find((l) => l.section === section && l.symbol === symbol)?.value;
// By the notation rule of the quantity's unit, as the working's lines print (src/units/notation).
const fmt = (v: unknown, unit: string, rule?: NumberRule) => (typeof v === "number" ? formatNumber(v, unit, rule) : "—");
const FACTOR: NumberRule = { decimals: 2 };

/**
 * What the schedule adds to a surface row's working, read from its lines: the spread between the
 * three exterior methods (with its chart) and the inside-surface check with its verdict.
 */
export function SurfaceRowChecks({ working }: { working: Working }) {
  const spread = working.charts.method_spread;
  if (spread === undefined || spread === null) return null;
  const ratio = pick(working, "Spread between methods", "ΔQ/|Q|");
  const sensitive = pick(working, "Spread between methods", "sensitive") === true;
  const I = "Inside surface";
  const condensation = pick(working, I, "condensation") === true;
  const mould = pick(working, I, "mould") === true;
  const hs = spread.map((p) => p.h_o_W_m2K);
  const qs = spread.map((p) => p.Q_W);
  const tone = condensation || mould ? "border-danger/50 bg-danger/10" : "border-line bg-surface";
  return (
    <div className="grid gap-4 lg:grid-cols-2">
      <section aria-label="Spread between methods" className="grid content-start gap-2 rounded-panel border border-line bg-surface p-3">
        <h3 className="text-small font-semibold">Spread between methods</h3>
        <p className="text-small text-muted">
          h_o {fmt(Math.min(...hs), "W/m²K")}–{fmt(Math.max(...hs), "W/m²K")} W/m²K, Q {fmt(Math.min(...qs), "W")} to {fmt(Math.max(...qs), "W")} W
          {typeof ratio === "number" ? `, a spread of ${Math.round(ratio * 100)} % of the chosen Q` : ""}.{" "}
          {sensitive ? <strong className="text-caution">Method-sensitive: the choice of method moves Q by more than 10 % (and more than 1 W/m²).</strong> : "Not method-sensitive (10 % or less, or under 1 W/m²)."}
        </p>
        <MethodSpreadChart charts={working.charts} />
      </section>
      <section aria-label="Inside surface" className={`grid content-start gap-2 rounded-panel border p-3 ${tone}`}>
        <h3 className="text-small font-semibold">Inside surface (ISO 13788)</h3>
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-small">
          <dt className="text-muted">Inside surface temperature T_si</dt>
          <dd className="tabular-nums">{fmt(pick(working, I, "T_si"), "°C")} °C</dd>
          <dt className="text-muted">Dew point of the zone air T_dp</dt>
          <dd className="tabular-nums">{fmt(pick(working, I, "T_dp,i"), "°C")} °C</dd>
          <dt className="text-muted">Least T_si against mould</dt>
          <dd className="tabular-nums">{fmt(pick(working, I, "T_si,min"), "°C")} °C</dd>
          <dt className="text-muted">f_Rsi against f_Rsi,min</dt>
          <dd className="tabular-nums">
            {fmt(pick(working, I, "f_Rsi"), "", FACTOR)} against {fmt(pick(working, I, "f_Rsi,min"), "", FACTOR)}
          </dd>
        </dl>
        <p className={`text-small font-semibold first-letter:uppercase ${condensation || mould ? "text-danger" : "text-ok"}`} role="status">
          {String(pick(working, I, "inside") ?? "")}
        </p>
      </section>
    </div>
  );
}

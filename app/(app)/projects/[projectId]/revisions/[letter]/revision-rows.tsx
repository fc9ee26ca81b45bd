import type { CalcResult, RowResult } from "@/calc/index";
import { SURFACE_RESULTS, resultValue } from "@/schedule/result-columns";
import type { TCheckSheet, TCheckState } from "@/checking/check-machine";
import { StateBadge } from "@/components/checking/state-badge";

/** One result column of a frozen revision's row table: heading, result key, decimals. */
export interface ResultCol {
  head: string;
  key: string;
  digits?: number;
  /** Words for a flag (e.g. condensation) instead of a number. */
  flag?: { yes: string; no: string };
  /** A schedule check (band, method-sensitive, inside surface) read as the grid reads it; frozen before v2 → "—". */
  check?: string;
}

export const SURFACE_COLS: ResultCol[] = [
  { head: "h_c (W/m²K)", key: "h_c_W_m2K", digits: 2 },
  { head: "h_o across methods (W/m²K)", key: "h_o_band", check: "h_o_band" },
  { head: "U (W/m²K)", key: "U_W_m2K", digits: 3 },
  { head: "T_surface (°C)", key: "T_surface_C", digits: 1 },
  { head: "Q (W)", key: "Q_W", digits: 0 },
  { head: "Q across methods (W)", key: "Q_band", check: "Q_band" },
  { head: "Method-sensitive", key: "method_sensitive", check: "method_sensitive" },
  { head: "T_si (°C)", key: "T_si_C", check: "T_si_C", digits: 1 },
  { head: "Inside surface", key: "inside_risk", check: "inside_risk" },
];
export const DUCT_COLS: ResultCol[] = [
  { head: "T_leaving (°C)", key: "T_leaving_C", digits: 2 },
  { head: "Q to the air (W)", key: "Q_W", digits: 0 },
  { head: "Condensation", key: "condensation", flag: { yes: "risk", no: "no" } },
];

export const num = (v: unknown, digits = 1) => (typeof v === "number" && Number.isFinite(v) ? v.toLocaleString("en-GB", { maximumFractionDigits: digits, minimumFractionDigits: digits }) : "—");
const valueOf = (r: CalcResult | undefined, key: string) => (r?.ok ? (r as unknown as Record<string, unknown>)[key] : undefined);

export interface FrozenRow {
  id: string;
  label: string;
  zone: string;
  result: CalcResult | undefined;
  /** The schedule's checks frozen with the result (revisions issued from v2 on). */
  checks?: Pick<RowResult, "spread" | "inside">;
  state: TCheckState;
  comments: number;
}

/** The rows of one sheet of a revision, with the results frozen in it and each row's check. */
export function RevisionRows({ sheet, rows, cols }: { sheet: TCheckSheet; rows: FrozenRow[]; cols: ResultCol[] }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-small" aria-label={sheet === "surfaces" ? "Surfaces" : "Duct runs"}>
        <thead className="text-left text-micro tracking-[0.02em] text-muted">
          <tr>
            <th className="py-2 pr-3">{sheet === "surfaces" ? "Surface" : "Duct run"}</th>
            <th className="py-2 pr-3">Zone</th>
            {cols.map((c) => (
              <th key={c.key} className={`py-2 pr-3 ${c.flag ? "" : "text-right"}`}>
                {c.head}
              </th>
            ))}
            <th className="py-2 pr-3">Check</th>
            <th className="py-2 text-right">Notes</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => {
            const warnings = row.result?.ok ? row.result.warnings.length : 0;
            return (
              <tr key={row.id} className="border-t border-line/60">
                <td className="py-1.5 pr-3">{row.label}</td>
                <td className="py-1.5 pr-3">{row.zone}</td>
                {cols.map((c) => {
                  if (c.check !== undefined) {
                    const col = SURFACE_RESULTS.find((x) => x.key === c.check)!;
                    const v = row.result ? resultValue(col, { result: row.result, ...row.checks }, "SI") : null;
                    const risk = typeof v === "string" && (v.startsWith("yes") || v.endsWith("risk"));
                    return <td key={c.key} className={`py-1.5 pr-3 text-right tabular-nums ${risk ? "font-semibold text-caution" : ""}`}>{typeof v === "number" ? num(v, c.digits) : (v ?? "—")}</td>;
                  }
                  const v = valueOf(row.result, c.key);
                  if (c.flag) return <td key={c.key} className={`py-1.5 pr-3 ${v === true ? "font-semibold text-danger" : "text-muted"}`}>{v === true ? c.flag.yes : v === false ? c.flag.no : "—"}</td>;
                  return <td key={c.key} className="py-1.5 pr-3 text-right tabular-nums">{num(v, c.digits)}</td>;
                })}
                <td className="py-1.5 pr-3">
                  <StateBadge state={row.state} />
                </td>
                <td className="py-1.5 text-right text-micro text-muted">
                  {warnings ? <span className="text-caution">{warnings} warning{warnings === 1 ? "" : "s"}</span> : null} {row.comments ? `${row.comments} comment${row.comments === 1 ? "" : "s"}` : ""}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

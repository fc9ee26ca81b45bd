/** Number and unit formatting of the report; units convert through an optional hook (IP projects). */

export interface UnitFormatter {
  /** Returns the value and unit to print for an SI value with its SI unit. */
  (value: number, unit: string): { value: number; unit: string };
}

/** Four significant figures, no exponent for everyday magnitudes. */
export function num(v: number | null | undefined, digits = 4): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return "-";
  if (v === 0) return "0";
  const a = Math.abs(v);
  if (a >= 1e6 || a < 1e-3) return v.toExponential(digits - 1);
  return String(Number(v.toPrecision(digits)));
}

export function withUnit(v: number | null | undefined, unit: string, convert?: UnitFormatter, digits = 4): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return "-";
  const c = convert && unit ? convert(v, unit) : { value: v, unit };
  return c.unit ? `${num(c.value, digits)} ${c.unit}` : num(c.value, digits);
}

/**
 * Validity ranges: a correlation used outside its published range still answers and adds an
 * `out_of_range` warning naming the quantity, its value and the range. Ranges are data in the
 * registry (src/calc/registry.ts); this file only compares and words the warning.
 */
import type { CalcWarning } from "./contract";

export interface Range {
  min?: number;
  max?: number;
  /** Relative slack on the lower bound (1.5 % on Pr ≥ 0.7/0.71: ordinary air sits at 0.70–0.72). */
  minSlack?: number;
  /** Unit printed after the value, e.g. "°C". */
  unit?: string;
}

export type Ranges = Readonly<Record<string, Range>>;

function fmt(v: number): string {
  if (v === 0) return "0";
  const a = Math.abs(v);
  if (a >= 1e5 || a < 1e-3) return v.toExponential(3).replace("e+", "e");
  return String(Math.round(v * 1000) / 1000);
}

const rangeTexts = new WeakMap<Range, string>();

export function rangeText(r: Range): string {
  const u = r.unit ? ` ${r.unit}` : "";
  if (r.min !== undefined && r.max !== undefined) return `${fmt(r.min)}…${fmt(r.max)}${u}`;
  if (r.min !== undefined) return `≥ ${fmt(r.min)}${u}`;
  if (r.max !== undefined) return `≤ ${fmt(r.max)}${u}`;
  return "any";
}

/** True when the value lies inside the range (slack applied to the lower bound). */
export function inRange(value: number, r: Range): boolean {
  if (r.min !== undefined && value < r.min * (1 - (r.minSlack ?? 0))) return false;
  if (r.max !== undefined && value > r.max) return false;
  return true;
}

/** Pushes an `out_of_range` warning when the value of `quantity` lies outside range `r`. */
export function checkRange(
  warnings: CalcWarning[] | null,
  methodId: string,
  title: string,
  quantity: string,
  value: number,
  r: Range,
): void {
  if (warnings === null || inRange(value, r)) return;
  const u = r.unit ? ` ${r.unit}` : "";
  let text = rangeTexts.get(r);
  if (text === undefined) {
    text = rangeText(r);
    rangeTexts.set(r, text);
  }
  warnings.push({
    code: "out_of_range",
    message: `${quantity} = ${fmt(value)}${u} is outside the range ${text} of ${title}; the value is extrapolated`,
    method: methodId,
    quantity,
    value,
    ...(r.min !== undefined ? { min: r.min } : {}),
    ...(r.max !== undefined ? { max: r.max } : {}),
  });
}

/** Adds a plain warning once (same code and message). */
export function addWarning(warnings: CalcWarning[] | null, code: string, message: string): void {
  if (warnings === null) return;
  if (!warnings.some((w) => w.code === code && w.message === message)) warnings.push({ code, message });
}

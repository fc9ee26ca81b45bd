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

// The words after the value ("… is outside the range 10000…1.000e9 of <title>; the value is
// extrapolated") depend only on the range and the title: made once and shared by every warning
// that uses them, so a large schedule's warnings hold one short string each, not a copy.
const tails = new WeakMap<Range, Map<string, string>>();

function tailText(r: Range, title: string): string {
  let byTitle = tails.get(r);
  if (byTitle === undefined) {
    byTitle = new Map();
    tails.set(r, byTitle);
  }
  let tail = byTitle.get(title);
  if (tail === undefined) {
    const u = r.unit ? ` ${r.unit}` : "";
    tail = `${u} is outside the range ${rangeText(r)} of ${title}; the value is extrapolated`;
    byTitle.set(title, tail);
  }
  return tail;
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
  warnings.push(outOfRange(methodId, quantity, value, r, quantity + " = " + fmt(value) + tailText(r, title)));
}

/** The warning object, one literal per set of bounds (a fixed shape each, no spread). */
function outOfRange(method: string, quantity: string, value: number, r: Range, message: string): CalcWarning {
  const code = "out_of_range";
  if (r.min !== undefined) {
    return r.max !== undefined
      ? { code, message, method, quantity, value, min: r.min, max: r.max }
      : { code, message, method, quantity, value, min: r.min };
  }
  return r.max !== undefined ? { code, message, method, quantity, value, max: r.max } : { code, message, method, quantity, value };
}

/** Adds a plain warning once (same code and message). */
export function addWarning(warnings: CalcWarning[] | null, code: string, message: string): void {
  if (warnings === null) return;
  if (!warnings.some((w) => w.code === code && w.message === message)) warnings.push({ code, message });
}

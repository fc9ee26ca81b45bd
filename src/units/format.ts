/**
 * Numbers as a schedule shows them: decimals chosen per quantity and unit system (50 mm reads
 * "50", 1.97 in needs two decimals; 0.800 m³/s is 1,695 cfm).
 */
import { toDisplay, type Quantity, type UnitSystem } from "./units";

// Decimals to add (or drop) in IP, where the IP unit is much smaller or larger than the SI one.
const IP_SHIFT: Partial<Record<Quantity, number>> = { thickness: 2, flow: -3, conductivity: -1, area: -1, film: 1, resistance: -1 };

export function decimals(q: Quantity, siDigits: number, system: UnitSystem): number {
  return Math.max(0, siDigits + (system === "IP" ? (IP_SHIFT[q] ?? 0) : 0));
}

const formats = new Map<number, Intl.NumberFormat>();
function formatter(d: number): Intl.NumberFormat {
  let f = formats.get(d);
  if (!f) {
    f = new Intl.NumberFormat("en-GB", { minimumFractionDigits: d, maximumFractionDigits: d });
    formats.set(d, f);
  }
  return f;
}

/** A shown number, already in display units, with `d` decimals and thousands separators. */
export function formatShown(v: number, d: number): string {
  return formatter(d).format(Object.is(v, -0) ? 0 : v);
}

/** An SI value formatted in the unit system, e.g. formatQuantity("power", 1234.5, "IP", 0) → "4,212". */
export function formatQuantity(q: Quantity, si: number, system: UnitSystem, siDigits: number): string {
  return formatShown(toDisplay(q, si, system), decimals(q, siDigits, system));
}

/** A count of things (rows, surfaces) with thousands separators: 4000 → "4,000". */
export function formatCount(n: number): string {
  return formatShown(n, 0);
}

/**
 * Number and unit formatting of the report; units convert through an optional hook (IP projects).
 * Tables carry the unit in the column heading (head()) and bare numbers in the cells (cell()); the
 * workings, where every line has its own unit, print both (withUnit()). Every number follows the
 * rule of its quantity (src/units/notation), as on screen.
 */
import { formatNumber } from "@/units/notation";

export interface UnitFormatter {
  /** Returns the value and unit to print for an SI value with its SI unit. */
  (value: number, unit: string): { value: number; unit: string };
}

/** A number by the rule of its (SI or display) unit. */
export function num(v: number | null | undefined, unit = ""): string {
  return formatNumber(v, unit);
}

function shown(v: number, unit: string, convert?: UnitFormatter): { value: number; unit: string } {
  return convert && unit ? convert(v, unit) : { value: v, unit };
}

/** A value in the project's units, without its unit (the unit is in the column heading). */
export function cell(v: number | null | undefined, unit: string, convert?: UnitFormatter): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return "–";
  const c = shown(v, unit, convert);
  return formatNumber(c.value, c.unit);
}

/** A column heading with the unit the column's cells are in: "Area (m²)". */
export function head(label: string, unit: string, convert?: UnitFormatter): string {
  return `${label} (${shown(1, unit, convert).unit})`;
}

export function withUnit(v: number | null | undefined, unit: string, convert?: UnitFormatter): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return "–";
  const c = shown(v, unit, convert);
  return c.unit ? `${formatNumber(c.value, c.unit)} ${c.unit}` : formatNumber(c.value, c.unit);
}

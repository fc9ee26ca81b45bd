/** Small helpers shared by the case kinds. */
import type { CalcWarning } from "../contract";
import { T0 } from "../constants";
import { airProperties, type AirProperties } from "../properties/air";
import { METHOD_BY_ID } from "../registry";
import { checkRange } from "../validity";

export type Warnings = CalcWarning[] | null;

/** Warns when `value` of `quantity` lies outside the range the registry holds for `methodId`. */
export function warnRange(warnings: Warnings, methodId: string, quantity: string, value: number): void {
  if (warnings === null) return;
  const m = METHOD_BY_ID[methodId];
  const r = m.ranges[quantity];
  if (r !== undefined) checkRange(warnings, methodId, m.title, quantity, value, r);
}

/** Warns when T_K lies outside the property model's range (no properties computed). */
export function warnAir(T_K: number, warnings: Warnings, label = "T_C"): void {
  if (warnings === null) return;
  const m = METHOD_BY_ID["air-lemmon-jacobsen"];
  checkRange(warnings, m.id, m.title, label, T_K - T0, m.ranges.T_C);
}

/** Air properties at T_K, warning when T_K lies outside the property model's range. */
export function air(T_K: number, p_Pa: number, warnings: Warnings, label = "T_C"): AirProperties {
  warnAir(T_K, warnings, label);
  return airProperties(T_K, p_Pa);
}

export const toK = (T_C: number): number => T_C + T0;
export const toC = (T_K: number): number => T_K - T0;

/** Small helpers shared by the case kinds. */
import type { CalcWarning } from "../contract";
import { T0 } from "../constants";
import { airProperties, type AirProperties } from "../properties/air";
import { METHOD_BY_ID } from "../registry";
import { checkRanges } from "../validity";

export type Warnings = CalcWarning[] | null;

/** Warns for every quantity outside the ranges the registry holds for `methodId`. */
export function warnRanges(warnings: Warnings, methodId: string, values: Record<string, number>): void {
  if (warnings === null) return;
  const m = METHOD_BY_ID[methodId];
  checkRanges(warnings, methodId, m.title, m.ranges, values);
}

/** Air properties at T_K, warning when T_K lies outside the property model's range. */
export function air(T_K: number, p_Pa: number, warnings: Warnings, label = "T_C"): AirProperties {
  if (warnings !== null) warnRanges(warnings, "air-lemmon-jacobsen", { [label]: T_K - T0 });
  return airProperties(T_K, p_Pa);
}

export const toK = (T_C: number): number => T_C + T0;
export const toC = (T_K: number): number => T_K - T0;

/**
 * Filmsheet's calculation engine: calculation contract v2 (shared/design/calc-contract.md).
 * Pure TypeScript with no I/O, so it runs the same in the browser and on the server.
 */

export { CalcBodyError, InputError } from "./contract";
export type { CalcResult, CalcWarning, CalcErrorBody } from "./contract";
export { METHODS, METHOD_BY_ID, dispatch } from "./registry";
export { pressureAtAltitude } from "./properties/atmosphere";
export { airProperties } from "./properties/air";
export { zoneTotals } from "./zone";
export { KIND_NAMES } from "./kinds";
export { calculate, calculateCase } from "./calculate";
export { EXTERIOR_METHODS, type ExteriorMethod } from "./surface";
export type { Terrain } from "./wind/wind-profile";
export type { WindLaw } from "./kinds/wind";

export * from "./schedule/types";
export { buildupResistance, ductRunCase, ductSurroundC, insideSurfaceResistance, insideTemperature, outdoorDuctSurroundC, rhCarried, solarOnSurface, surfaceCase } from "./schedule/cases";
export { insideSurfaceCheck, methodSpread, METHOD_SENSITIVE_MIN_W_M2, METHOD_SENSITIVE_SHARE, MOULD_SURFACE_RH, type InsideSurfaceCheck, type MethodSpread } from "./schedule/checks";
export { TOTAL_EXCLUSIONS, exclusionsSentence, type Exclusion } from "./schedule/exclusions";
export { OVER_GROUND_MESSAGE, ductRunRowResult, scheduleResults, surfaceRowResult, zoneTotalsOf, type Schedule, type ScheduleResults, type RowResult, type ZoneTotalsRow } from "./schedule/results";
export { working } from "./working/index";
export type { Working, WorkingLine, MethodUsed, WorkingCharts, LocalHPoint, WindPoint, MethodSpreadPoint } from "./working/index";
export { ductRunRowWorking, insideVerdict, methodName, surfaceRowWorking } from "./working/schedule-row";
export {
  BREAKDOWN_RULES, ELEMENT_LABELS, ELEMENT_TYPES, ORIENTATION_BINS, ORIENTATION_LABELS, VERTICAL_BAND_DEG, caseBreakdowns, caseRowsOf, elementOf, isGlazing,
  leftOutSentence, orientationOf, scheduleBreakdowns, zonePeaks,
  type BreakdownLine, type Breakdowns, type CaseBreakdowns, type CasePeak, type CaseRows, type ElementType, type LeftOutRow, type OrientationBin, type ZonePeak,
} from "./schedule/breakdowns";

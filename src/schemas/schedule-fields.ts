/**
 * The fields of a project's schedule as data: label, quantity (for units), bounds and whether a
 * blank means "inherit". The zod schemas (schedule-zod.ts), the grid's editors, the forms and the
 * importer all read these, so a field's rule and its message are written once. Bounds are in SI;
 * messages come out in the unit system the person works in.
 */
import { DEFAULT_JACKET_ABSORPTANCE } from "@/calc/schedule/types";
import { displayBound, unitLabel, type Quantity, type UnitSystem } from "@/units/units";

/** The schedule's two sheets. */
export const SHEETS = ["surfaces", "duct_runs"] as const;
export type TSheet = (typeof SHEETS)[number];

export interface NumberSpec {
  label: string;
  quantity: Quantity;
  /** Inclusive lower bound (SI). */
  min?: number;
  /** Exclusive lower bound (SI). */
  gt?: number;
  /** Inclusive upper bound (SI). */
  max?: number;
  /** Blank is allowed and means what this says (e.g. "the build-up's value"). */
  blank?: string;
  /** Decimals shown in the grid, per unit system. */
  digits: number;
  /** A line under the field in forms, for inputs whose meaning is not plain from the label. */
  hint?: string;
}

export const TERRAIN_OPTIONS = [
  { value: "city", label: "City centre" },
  { value: "suburban", label: "Suburbs, towns, woodland" },
  { value: "open", label: "Open country" },
  { value: "water", label: "Open water or coast" },
] as const;
export const WIND_LAW_OPTIONS = [
  { value: "power", label: "Power law" },
  { value: "log", label: "Logarithmic law" },
] as const;
export const METHOD_OPTIONS = [
  { value: "boundary_layer", label: "Boundary layer" },
  { value: "iso6946", label: "ISO 6946 linear" },
  { value: "mcadams", label: "McAdams wind formula" },
] as const;
export const UNIT_OPTIONS = [
  { value: "SI", label: "SI (°C, m, W)" },
  { value: "IP", label: "IP (°F, ft, Btu/h)" },
] as const;
export const CASE_KIND_OPTIONS = [
  { value: "heating", label: "Heating" },
  { value: "cooling", label: "Cooling" },
] as const;
export const SHAPE_OPTIONS = [
  { value: "round", label: "Round" },
  { value: "rect", label: "Rectangular" },
] as const;
export const LOCATION_OPTIONS = [
  { value: "indoor", label: "Indoors" },
  { value: "outdoor", label: "Outdoors" },
] as const;

/** What lies outside a surface (v2): only outside air is computed; the ground needs ISO 13370. */
export const EXPOSURE_OPTIONS = [
  { value: "outside_air", label: "Outside air" },
  { value: "ground", label: "Ground" },
] as const;
/** A yes/no input as it is written in the sheets, files and pastes; stored as a boolean. */
export const YES_NO_OPTIONS = [
  { value: "yes", label: "Yes" },
  { value: "no", label: "No" },
] as const;

export type Option = { readonly value: string; readonly label: string };
export const values = <T extends readonly Option[]>(o: T) => o.map((x) => x.value) as unknown as [T[number]["value"], ...T[number]["value"][]];
export const labelOf = (o: readonly Option[], v: string | null | undefined) => o.find((x) => x.value === v)?.label ?? v ?? "";

const TEMP = { quantity: "temperature", min: -50, max: 150, digits: 1 } as const;
const RH = { quantity: "percent", gt: 0, max: 100, digits: 0 } as const;
const FRACTION = { quantity: "fraction", min: 0, max: 1, digits: 2 } as const;

export const PROJECT_NUMBERS = {
  altitude_m: { label: "Site altitude", quantity: "length", min: -500, max: 5000, digits: 0 },
} satisfies Record<string, NumberSpec>;

export const DESIGN_CASE_NUMBERS = {
  T_outdoor_C: { ...TEMP, label: "Outdoor dry-bulb" },
  RH_outdoor_pct: { ...RH, label: "Outdoor RH" },
  V_met_m_s: { label: "Wind at the met mast", quantity: "speed", min: 0, max: 60, digits: 1 },
  wind_from_deg: { label: "Wind from", quantity: "angle", min: 0, max: 360, digits: 0 },
  cloud_cover: {
    ...FRACTION,
    digits: 1,
    label: "Cloud cover",
    hint: "0 clear sky … 1 overcast. Clear (0) is the cautious choice for heating and for condensation on outdoor ducts",
  },
} satisfies Record<string, NumberSpec>;

export const SOLAR_SPEC: NumberSpec = { label: "Solar irradiance", quantity: "heat_flux", min: 0, max: 1400, digits: 0 };

export const ZONE_NUMBERS = {
  floor_area_m2: { label: "Floor area", quantity: "area", gt: 0, max: 1e6, digits: 1 },
  T_heating_C: { ...TEMP, min: -10, max: 40, label: "Heating set point" },
  T_cooling_C: { ...TEMP, min: -10, max: 40, label: "Cooling set point" },
  RH_inside_pct: { ...RH, label: "Inside RH" },
} satisfies Record<string, NumberSpec>;

export const BUILDUP_NUMBERS = {
  R_direct_m2K_W: { label: "Direct R", quantity: "resistance", min: 0, max: 50, blank: "from the layers", digits: 3 },
  absorptance: { ...FRACTION, label: "Solar absorptance" },
  emissivity: { ...FRACTION, label: "Emissivity" },
} satisfies Record<string, NumberSpec>;

export const LAYER_NUMBERS = {
  thickness_m: { label: "Thickness", quantity: "thickness", gt: 0, max: 2, digits: 1 },
  k_W_mK: { label: "Conductivity", quantity: "conductivity", gt: 0, max: 500, digits: 3 },
} satisfies Record<string, NumberSpec>;

/** Labels of the v2 inputs that are not numbers (the sheets, forms and messages share them). */
export const EXPOSED_TO_LABEL = "Outside of surface";
export const IN_SERVED_ZONE_LABEL = "Inside the zone it serves";

export const SURFACE_NUMBERS = {
  area_m2: { label: "Area", quantity: "area", gt: 0, max: 1e5, digits: 2 },
  tilt_deg: { label: "Tilt", quantity: "angle", min: 0, max: 180, digits: 0 },
  azimuth_deg: { label: "Azimuth", quantity: "angle", min: 0, max: 360, digits: 0 },
  height_m: { label: "Centroid height", quantity: "length", min: 0, max: 500, digits: 1 },
  length_m: { label: "Length along the wind", quantity: "length", gt: 0, max: 500, digits: 1 },
  panel_height_m: { label: "Panel height", quantity: "length", gt: 0, max: 500, digits: 1 },
  absorptance: { ...FRACTION, label: "Absorptance", blank: "the build-up's" },
  emissivity: { ...FRACTION, label: "Emissivity", blank: "the build-up's" },
} satisfies Record<string, NumberSpec>;

export const DUCT_RUN_NUMBERS = {
  diameter_m: { label: "Diameter", quantity: "thickness", gt: 0, max: 5, blank: "not round", digits: 0 },
  width_m: { label: "Width", quantity: "thickness", gt: 0, max: 5, blank: "not rectangular", digits: 0 },
  height_m: { label: "Height", quantity: "thickness", gt: 0, max: 5, blank: "not rectangular", digits: 0 },
  length_m: { label: "Length", quantity: "length", gt: 0, max: 2000, digits: 1 },
  flow_m3_s: { label: "Airflow", quantity: "flow", gt: 0, max: 200, digits: 3 },
  T_entering_heating_C: { ...TEMP, label: "Entering air, heating" },
  T_entering_cooling_C: { ...TEMP, label: "Entering air, cooling" },
  T_surround_C: { ...TEMP, label: "Surrounding air", blank: "outdoor air" },
  // A void or plant room is warmer in summer: cooling cases take this one when it is given.
  T_surround_cooling_C: { ...TEMP, label: "Surrounding air, cooling", blank: "as heating" },
  RH_surround_pct: { ...RH, label: "Surrounding RH", blank: "outdoor or zone RH" },
  elevation_m: { label: "Elevation", quantity: "length", min: 0, max: 500, blank: "10 m", digits: 1 },
  insulation_thickness_m: { label: "Insulation", quantity: "thickness", min: 0, max: 0.5, digits: 0 },
  insulation_k_W_mK: { label: "Insulation conductivity", quantity: "conductivity", gt: 0, max: 5, digits: 3 },
  jacket_emissivity: { ...FRACTION, label: "Jacket emissivity" },
  margin_K: { label: "Condensation margin", quantity: "temperature_difference", min: 0, max: 20, digits: 1 },
  // Sun on a run out of doors: bright aluminium ≈ 0.2, weathered or painted metal ≈ 0.6, black ≈ 0.9.
  jacket_absorptance: { ...FRACTION, label: "Jacket solar absorptance", blank: String(DEFAULT_JACKET_ABSORPTANCE) },
} satisfies Record<string, NumberSpec>;

/** A unit suffix as written after a number ("" for fractions, no space before ° and %). */
export function unitSuffix(q: Quantity, system: UnitSystem): string {
  const u = unitLabel(q, system);
  if (u === "") return "";
  return u === "°" || u === "%" ? u : ` ${u}`;
}

/**
 * Why a value breaks its field's rule, in the person's units, or null when it is fine. `value`
 * is in SI; null/undefined is allowed only for fields with a `blank` meaning.
 */
export function numberProblem(spec: NumberSpec, value: number | null | undefined, system: UnitSystem = "SI"): string | null {
  if (value === null || value === undefined) return spec.blank === undefined ? `${spec.label} is required` : null;
  if (typeof value !== "number" || !Number.isFinite(value)) return `${spec.label} must be a number`;
  const b = (v: number) => `${displayBound(spec.quantity, v, system)}${unitSuffix(spec.quantity, system)}`;
  const low = spec.gt !== undefined ? value <= spec.gt : spec.min !== undefined && value < spec.min;
  const high = spec.max !== undefined && value > spec.max;
  if (!low && !high) return null;
  if (spec.gt !== undefined && spec.max !== undefined) return `${spec.label} must be greater than ${b(spec.gt)} and at most ${b(spec.max)}`;
  if (spec.min !== undefined && spec.max !== undefined) return `${spec.label} must be between ${b(spec.min)} and ${b(spec.max)}`;
  if (spec.gt !== undefined) return `${spec.label} must be greater than ${b(spec.gt)}`;
  if (spec.min !== undefined) return `${spec.label} must be at least ${b(spec.min)}`;
  return `${spec.label} must be at most ${b(spec.max as number)}`;
}

/**
 * The schedule as the engine sees it: a project's site, design cases, zones, build-ups, surfaces
 * and duct runs, in SI. The database rows and zod schemas (src/schemas) map onto these; the engine
 * turns them into contract cases (schedule/cases.ts) and totals (schedule/results.ts).
 */
import type { ExteriorMethod } from "../surface";
import type { Terrain } from "../wind/wind-profile";
import type { WindLaw } from "../kinds/wind";

export interface Site {
  altitude_m: number;
  terrain: Terrain;
  wind_law: WindLaw;
  /** The firm's or project's default exterior convection method. */
  method: ExteriorMethod;
}

/** Orientations for which a design case gives solar irradiance on a vertical surface, plus horizontal. */
export const ORIENTATIONS = ["N", "NE", "E", "SE", "S", "SW", "W", "NW"] as const;
export type Orientation = (typeof ORIENTATIONS)[number];
export type SolarTable = Partial<Record<Orientation | "horizontal", number>>;

export interface DesignCase {
  id: string;
  name: string;
  kind: "heating" | "cooling";
  T_outdoor_C: number;
  RH_outdoor_pct: number;
  V_met_m_s: number;
  wind_from_deg: number;
  /** Irradiance, W/m², on vertical surfaces by orientation and on a horizontal one; absent = 0. */
  solar_W_m2: SolarTable;
  /**
   * Cloud cover, 0 (clear, the conservative choice for heating) … 1 (overcast); absent (as in
   * revisions issued before v2) = 0.
   */
  cloud_cover?: number;
}

export interface Zone {
  id: string;
  name: string;
  floor_area_m2: number;
  T_heating_C: number;
  T_cooling_C: number;
  RH_inside_pct: number;
}

export interface Layer {
  material: string;
  thickness_m: number;
  k_W_mK: number;
}

export interface Buildup {
  id: string;
  name: string;
  /** Either layers (R = Σ t/k) or a direct construction resistance; surface resistances excluded. */
  layers: Layer[];
  R_direct_m2K_W: number | null;
  absorptance: number;
  emissivity: number;
}

export interface SurfaceRow {
  id: string;
  zone_id: string;
  buildup_id: string;
  label: string;
  area_m2: number;
  tilt_deg: number;
  azimuth_deg: number;
  height_m: number;
  length_m: number;
  panel_height_m: number;
  /** Per-row overrides; null keeps the project's or build-up's value. */
  method: ExteriorMethod | null;
  absorptance: number | null;
  emissivity: number | null;
  /**
   * What lies outside the surface: outside air (the default, and the only case Filmsheet
   * computes) or the ground, whose heat loss needs ISO 13370 and is left out of the totals.
   */
  exposed_to?: SurfaceExposure;
}

export const SURFACE_EXPOSURES = ["outside_air", "ground"] as const;
export type SurfaceExposure = (typeof SURFACE_EXPOSURES)[number];

export interface DuctRunRow {
  id: string;
  zone_id: string;
  label: string;
  shape: "round" | "rect";
  diameter_m: number | null;
  width_m: number | null;
  height_m: number | null;
  length_m: number;
  flow_m3_s: number;
  T_entering_heating_C: number;
  T_entering_cooling_C: number;
  location: "indoor" | "outdoor";
  /**
   * Temperature of the space the run crosses in heating cases, and in cooling cases when
   * `T_surround_cooling_C` is null; null = the outdoor air of the design case.
   */
  T_surround_C: number | null;
  /**
   * Temperature of that space in cooling cases; null (or absent, as in revisions issued before
   * the field existed) = as `T_surround_C`. Both null = the outdoor air.
   */
  T_surround_cooling_C?: number | null;
  /** Relative humidity of that space; null = outdoor RH (outdoors) or the zone's inside RH. */
  RH_surround_pct: number | null;
  /** Height above ground of an outdoor run, for the wind at the duct; null = 10 m. */
  elevation_m: number | null;
  insulation_thickness_m: number;
  insulation_k_W_mK: number;
  jacket_emissivity: number;
  margin_K: number;
  /**
   * The run lies inside the zone it serves: it crosses that zone's air (set point and humidity of
   * the case), and its heat stays in the zone, so the zone's totals leave it out. Absent = false.
   */
  in_served_zone?: boolean;
  /** Solar absorptance of the jacket, for runs out of doors in the sun; null/absent = 0.6. */
  jacket_absorptance?: number | null;
}

/** Jacket absorptance assumed when a row gives none: weathered metal or painted (common practice). */
export const DEFAULT_JACKET_ABSORPTANCE = 0.6;

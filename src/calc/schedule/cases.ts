/**
 * From a schedule row and a design case to a contract case (calc-contract.md): the one place that
 * decides which temperatures, wind, solar and resistances a row sees in a design case. The cases
 * are plain contract requests, so the browser, the server and `npm run calc` compute them alike.
 */
import { pressureAtAltitude } from "../properties/atmosphere";
import { radiantTemperature, skyTemperatureCloudy, skyViewFactor } from "../radiation/radiation";
import { saturationPressureHylandWexler } from "../psychrometrics/dew-point";
import { windSpeedLogLaw, windSpeedPowerLaw } from "../wind/wind-profile";
import { DEFAULT_JACKET_ABSORPTANCE, ORIENTATIONS, type Buildup, type DesignCase, type DuctRunRow, type Site, type SolarTable, type SurfaceRow, type Zone } from "./types";

/** Construction resistance of a build-up, m²K/W: Σ t/k over its layers, or its direct R. */
export function buildupResistance(b: Pick<Buildup, "layers" | "R_direct_m2K_W">): number {
  if (b.layers.length > 0) {
    let R = 0;
    for (const l of b.layers) R += l.thickness_m / l.k_W_mK;
    return R;
  }
  return b.R_direct_m2K_W ?? 0;
}

/**
 * Irradiance on a surface from a design case's table, W/m²: on vertical faces interpolated
 * linearly in azimuth between the two neighbouring compass points; on tilted faces blended
 * linearly in tilt between the horizontal value (tilt 0) and the vertical one (tilt 90); faces
 * turned downward (tilt > 90) take the vertical value scaled down to 0 at tilt 180. A schedule-level
 * estimate (common practice); a row needing better takes its irradiance from a solar study.
 */
export function solarOnSurface(table: SolarTable, tiltDeg: number, azimuthDeg: number): number {
  const a = ((azimuthDeg % 360) + 360) % 360;
  const i = Math.floor(a / 45) % 8;
  const f = (a - i * 45) / 45;
  const v0 = table[ORIENTATIONS[i]] ?? 0;
  const v1 = table[ORIENTATIONS[(i + 1) % 8]] ?? 0;
  const vertical = v0 + f * (v1 - v0);
  const horizontal = table.horizontal ?? 0;
  if (tiltDeg <= 90) return horizontal + (tiltDeg / 90) * (vertical - horizontal);
  return vertical * ((180 - tiltDeg) / 90);
}

/** Inside temperature of a zone in a design case: heating or cooling set point by the case's kind. */
export function insideTemperature(zone: Zone, dc: DesignCase): number {
  return dc.kind === "heating" ? zone.T_heating_C : zone.T_cooling_C;
}

/**
 * Inside surface resistance R_si, m²K/W, by the direction of heat flow (ISO 6946:2017, Table 7):
 * 0.10 upwards, 0.13 horizontal (within ±30° of the horizontal plane), 0.17 downwards. Heat flows
 * outward through the surface when the inside is the warmer side (the outward normal of a face
 * at tilt t rises 90 − t degrees above the horizontal), inward otherwise: a roof is 0.10 in
 * heating and 0.17 in summer, a soffit over outside air the other way round, a wall 0.13.
 */
export function insideSurfaceResistance(tiltDeg: number, T_inside_C: number, T_outside_C: number): number {
  const outward = 90 - tiltDeg;
  const flow = T_inside_C >= T_outside_C ? outward : -outward;
  if (flow > 30) return 0.1;
  if (flow < -30) return 0.17;
  return 0.13;
}

/** The `surface` case of a row in a design case. */
export function surfaceCase(site: Site, dc: DesignCase, zone: Zone, buildup: Buildup, row: SurfaceRow) {
  const T_inside_C = insideTemperature(zone, dc);
  return {
    id: row.id,
    kind: "surface" as const,
    area_m2: row.area_m2,
    tilt_deg: row.tilt_deg,
    azimuth_deg: row.azimuth_deg,
    height_m: row.height_m,
    length_m: row.length_m,
    panel_height_m: row.panel_height_m,
    R_construction_m2K_W: buildupResistance(buildup),
    R_si_m2K_W: insideSurfaceResistance(row.tilt_deg, T_inside_C, dc.T_outdoor_C),
    T_inside_C,
    T_outside_C: dc.T_outdoor_C,
    V_met_m_s: dc.V_met_m_s,
    wind_from_deg: dc.wind_from_deg,
    terrain: site.terrain,
    law: site.wind_law,
    emissivity: row.emissivity ?? buildup.emissivity,
    absorptance: row.absorptance ?? buildup.absorptance,
    solar_W_m2: solarOnSurface(dc.solar_W_m2, row.tilt_deg, row.azimuth_deg),
    method: row.method ?? site.method,
    cloud_cover: dc.cloud_cover ?? 0,
    pressure_Pa: pressureAtAltitude(site.altitude_m),
  };
}

/** Height assumed for an outdoor duct run without one, m (a low-rise roof). */
export const DEFAULT_DUCT_ELEVATION_M = 10;

/**
 * Radiant surround of a duct run out of doors, °C: a horizontal run sees the sky over its upper
 * half and the ground below (view factor ½ each, as a vertical plane: common practice), the sky at
 * Swinbank's clear-sky temperature under the case's cloud cover and the ground at the outdoor air
 * temperature. On a clear night this cools the jacket below the air around it, which is when
 * outdoor ducts condense.
 */
export function outdoorDuctSurroundC(T_outdoor_C: number, cloud_cover = 0): number {
  const T = T_outdoor_C + 273.15;
  return radiantTemperature(skyViewFactor(90), skyTemperatureCloudy(T, cloud_cover), T) - 273.15;
}

/**
 * Relative humidity, %, at T_C of air that carries the vapour of air at T_from_C and RH_from_pct:
 * a void or plant room takes the zone air's moisture (its dew point), not its RH at another
 * temperature (a 28 °C void under a 24 °C / 50 % zone is 39 % RH, dew point 12.9 °C; at 50 % it
 * would be 16.6 °C). Capped at 100 % (colder than the zone's dew point: saturated).
 */
export function rhCarried(T_from_C: number, RH_from_pct: number, T_C: number): number {
  if (T_C === T_from_C) return RH_from_pct;
  const rh = (RH_from_pct * saturationPressureHylandWexler(T_from_C)) / saturationPressureHylandWexler(T_C);
  return rh > 100 ? 100 : rh;
}

/**
 * Temperature of the space a duct run crosses in a design case, °C, or null for the outdoor air:
 * a cooling case takes the row's cooling surround when it gives one, else (as a heating case
 * always does) its `T_surround_C`.
 */
export function ductSurroundC(dc: Pick<DesignCase, "kind">, row: Pick<DuctRunRow, "T_surround_C" | "T_surround_cooling_C">): number | null {
  return dc.kind === "cooling" ? (row.T_surround_cooling_C ?? row.T_surround_C) : row.T_surround_C;
}

/**
 * The `duct_run` case of a row in a design case. A run inside the zone it serves crosses that
 * zone's air (its set point and humidity in the case). Otherwise it crosses the space at the
 * case's surround (`ductSurroundC`; the outdoor air when there is none). Humidity: the row's own
 * RH when it gives one; else the outdoor air's (outdoors, or in the outdoor air); else the served
 * zone's moisture carried to the space's temperature (`rhCarried`). An outdoor run sees the site
 * wind at its elevation; in the outdoor air it radiates to sky and ground under the case's cloud
 * cover and absorbs the case's irradiance on the horizontal.
 */
export function ductRunCase(site: Site, dc: DesignCase, zone: Zone, row: DuctRunRow) {
  const inZone = row.in_served_zone === true;
  const T_zone = insideTemperature(zone, dc);
  const surround = inZone ? T_zone : ductSurroundC(dc, row);
  const outdoorAir = surround === null;
  const outdoor = row.location === "outdoor" && !inZone;
  // Out of doors in the outdoor air: radiation to sky and ground, and the sun (a run in a space of
  // its own, a surround given for this case, radiates to that space).
  const skyward = outdoor && outdoorAir;
  const T_ambient_C = surround === null ? dc.T_outdoor_C : surround;
  const RH =
    row.RH_surround_pct ??
    (outdoor || outdoorAir ? dc.RH_outdoor_pct : rhCarried(T_zone, zone.RH_inside_pct, T_ambient_C));
  const z = row.elevation_m ?? DEFAULT_DUCT_ELEVATION_M;
  const wind = outdoor
    ? site.wind_law === "log"
      ? windSpeedLogLaw(dc.V_met_m_s, z, site.terrain, 10)
      : windSpeedPowerLaw(dc.V_met_m_s, z, site.terrain, 10)
    : 0;
  const section = row.shape === "round" ? { diameter_m: row.diameter_m } : { width_m: row.width_m, height_m: row.height_m };
  return {
    id: row.id,
    kind: "duct_run" as const,
    shape: row.shape,
    ...section,
    length_m: row.length_m,
    flow_m3_s: row.flow_m3_s,
    T_entering_C: dc.kind === "heating" ? row.T_entering_heating_C : row.T_entering_cooling_C,
    T_ambient_C,
    RH_ambient_pct: RH,
    insulation_thickness_m: row.insulation_thickness_m,
    insulation_k_W_mK: row.insulation_k_W_mK,
    jacket_emissivity: row.jacket_emissivity,
    location: inZone ? ("indoor" as const) : row.location,
    V_wind_m_s: wind,
    margin_K: row.margin_K,
    pressure_Pa: pressureAtAltitude(site.altitude_m),
    ...(skyward
      ? {
          T_surround_C: outdoorDuctSurroundC(dc.T_outdoor_C, dc.cloud_cover ?? 0),
          absorptance: row.jacket_absorptance ?? DEFAULT_JACKET_ABSORPTANCE,
          solar_W_m2: dc.solar_W_m2.horizontal ?? 0,
        }
      : {}),
  };
}

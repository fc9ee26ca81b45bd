/** Wind speed at height from a met-mast reading, by terrain. */

export type Terrain = "city" | "suburban" | "open" | "water";
export const TERRAINS: readonly Terrain[] = ["city", "suburban", "open", "water"];

/** Power-law exponent a and gradient height δ (m) by terrain. */
export const POWER_LAW: Record<Terrain, { a: number; delta_m: number }> = {
  water: { a: 0.1, delta_m: 210 },
  open: { a: 0.14, delta_m: 270 },
  suburban: { a: 0.22, delta_m: 370 },
  city: { a: 0.33, delta_m: 460 },
};

/** Roughness length z0 (m) and minimum height z_min (m) of EN 1991-1-4 by terrain. */
export const LOG_LAW: Record<Terrain, { z0_m: number; zmin_m: number }> = {
  water: { z0_m: 0.003, zmin_m: 1 },
  open: { z0_m: 0.05, zmin_m: 2 },
  suburban: { z0_m: 0.3, zmin_m: 5 },
  city: { z0_m: 1.0, zmin_m: 10 },
};

/**
 * Power-law wind profile from a met mast in open terrain:
 * V = V_met (δ_met/H_met)^a_met (H/δ)^a; above the gradient height δ the speed stays constant.
 * @param Vmet met-mast wind speed, m/s, at Hmet in open terrain
 * @param H height above ground, m
 * @param terrain terrain category at the site
 * @param Hmet met-mast height, m (10 m by default)
 * Validity: H ≤ δ of the terrain.
 * @example 5 m/s, 25 m, city → 3.03 m/s
 * @see ASHRAE Handbook—Fundamentals (2017), ch. 24 "Airflow around buildings", eq. 4 and table 1.
 */
export function windSpeedPowerLaw(Vmet: number, H: number, terrain: Terrain, Hmet: number): number {
  const met = POWER_LAW.open;
  const site = POWER_LAW[terrain];
  const h = Math.min(H, site.delta_m);
  return Vmet * Math.pow(met.delta_m / Hmet, met.a) * Math.pow(h / site.delta_m, site.a);
}

/** Terrain factor k_r = 0.19 (z0/z0,II)^0.07 of EN 1991-1-4, eq. 4.5.  * @example z0 0.3 m (terrain III) → 0.215 (EN 1991-1-4 table 4.1 lists k_r 0.215, from memory)
 * @see EN 1991-1-4:2005, eq. 4.5.
 */
export function terrainFactorEn1991(z0: number): number {
  return 0.19 * Math.pow(z0 / 0.05, 0.07);
}

/**
 * Logarithmic wind profile of EN 1991-1-4 (roughness factor c_r = k_r ln(max(z, z_min)/z0)):
 * V = V_met · c_r(z)/c_r,open(H_met).
 * @param Vmet met-mast wind speed, m/s, at Hmet in open terrain
 * @param z height above ground, m
 * @param terrain terrain category at the site
 * @param Hmet met-mast height, m
 * Validity: z_min ≤ z ≤ 200 m.
 * @example 10 m/s, 25 m, suburban → 9.46 m/s
 * @see EN 1991-1-4:2005, Eurocode 1: Actions on structures — Wind actions, §4.3.2, table 4.1.
 */
export function windSpeedLogLaw(Vmet: number, z: number, terrain: Terrain, Hmet: number): number {
  const site = LOG_LAW[terrain];
  const open = LOG_LAW.open;
  const crSite = terrainFactorEn1991(site.z0_m) * Math.log(Math.max(z, site.zmin_m) / site.z0_m);
  const crMet = terrainFactorEn1991(open.z0_m) * Math.log(Math.max(Hmet, open.zmin_m) / open.z0_m);
  return (Vmet * crSite) / crMet;
}

/**
 * Exposure of a face to the wind, w in 0…1 (contract v2): 1 when the wind comes from within 80°
 * of the outward normal, 0 from 100°, linear between (w_az = clamp((100 − Δ)/20, 0, 1)); faces
 * within 10° of the horizontal are fully exposed, fading to the azimuth rule by 20°
 * (w_tilt = clamp((20 − t)/10, 0, 1), t = min(tilt, 180 − tilt)); w = max(w_az, w_tilt).
 * Blending over 20° replaces v1's step at 90°, which dropped h_c by half for a change of wind
 * direction of a thousandth of a degree (common practice: no single published source fixes the
 * width of the band; 20° is the contract's choice).
 * @param windFromDeg direction the wind comes from, degrees clockwise from north
 * @param azimuthDeg outward normal of the face, degrees clockwise from north
 * @param tiltDeg tilt from the horizontal, degrees (0 faces up, 180 faces down)
 * @example wind from 265°, face to 180°: Δ = 85° → 0.75
 * @see Filmsheet calculation contract v2, `surface`.
 */
export function exposureWeight(windFromDeg: number, azimuthDeg: number, tiltDeg: number): number {
  const d = Math.abs(((((windFromDeg - azimuthDeg) % 360) + 540) % 360) - 180);
  const wAz = clamp01((100 - d) / 20);
  const t = Math.min(tiltDeg, 180 - tiltDeg);
  const wTilt = clamp01((20 - t) / 10);
  return wAz > wTilt ? wAz : wTilt;
}

function clamp01(x: number): number {
  return x < 0 ? 0 : x > 1 ? 1 : x;
}

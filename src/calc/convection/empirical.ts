/** Empirical exterior convection coefficients from wind speed alone. */

/**
 * ISO 6946 simplified exterior convection coefficient: h_c = 4 + 4v.
 * @param v wind speed at the surface, m/s
 * @example v 4 m/s → 20 W/m²K (with h_r ≈ 5 gives R_se ≈ 0.04 m²K/W)
 * @see ISO 6946:2017, Building components and building elements — Thermal resistance and thermal
 *   transmittance — Calculation methods, annex C (C.2, external surfaces).
 */
export function hcIso6946(v: number): number {
  return 4 + 4 * v;
}

/**
 * McAdams wind formula for rough exterior surfaces: h = 5.7 + 3.8v for v < 5 m/s, 7.2 v^0.78 above.
 * @param v wind speed at the surface, m/s
 * @example v 3 m/s → 17.1 W/m²K
 * @see W. H. McAdams, Heat Transmission (3rd ed.), McGraw-Hill (1954), p. 249; Duffie & Beckman,
 *   Solar Engineering of Thermal Processes, §3.15.
 */
export function hcMcAdams(v: number): number {
  return v < 5 ? 5.7 + 3.8 * v : 7.2 * Math.pow(v, 0.78);
}

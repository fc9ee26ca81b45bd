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
 * McAdams wind coefficient, convective part only: h_c = 2.8 + 3.0v. The Jürges plate data behind
 * McAdams's h = 5.7 + 3.8v include long-wave radiation and free convection; Watmuff, Charters &
 * Proctor removed them, leaving the wind-driven convection, so the surface balance can add its
 * own radiation without counting it twice (contract v2; v1's 5.7 + 3.8v made a 4 m/s winter
 * wall's h_o about 35 % high).
 * @param v wind speed at the surface, m/s
 * Validity: v ≤ 7 m/s (the range of the underlying plate data).
 * @example v 3 m/s → 11.8 W/m²K (Duffie & Beckman, §3.15, quoting Watmuff et al.: h = 2.8 + 3.0V, from memory)
 * @see J. H. Watmuff, W. W. S. Charters, D. Proctor, Solar and wind induced external coefficients
 *   for solar collectors, COMPLES No. 2 (1977) p. 56; W. H. McAdams, Heat Transmission (3rd ed.,
 *   1954); Duffie & Beckman, Solar Engineering of Thermal Processes (4th ed.), §3.15.
 */
export function hcMcAdams(v: number): number {
  return 2.8 + 3.0 * v;
}

/** Site pressure from altitude. */

/**
 * Pressure of the ICAO/ISO standard atmosphere in the troposphere:
 * p = 101325 (1 − L z/T0)^(g M/(R L)), L = 0.0065 K/m, T0 = 288.15 K, exponent 5.25588.
 * @param altitude_m geopotential altitude above sea level, m (−500…11 000)
 * @returns pressure, Pa
 * @example 1500 m → 84 556 Pa
 * @see ISO 2533:1975 Standard Atmosphere; U.S. Standard Atmosphere 1976; ASHRAE Handbook—
 *   Fundamentals (2017), ch. 1, eq. 3.
 */
export function pressureAtAltitude(altitude_m: number): number {
  return 101325 * Math.pow(1 - (0.0065 * altitude_m) / 288.15, 5.25588);
}

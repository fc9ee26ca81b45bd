/** Long-wave radiation: linearised coefficient, sky temperature and sky view factor. */
import { SIGMA } from "../constants";

/**
 * Linearised radiative coefficient between a grey surface and large surroundings:
 * h_r = εσ(T_s² + T_r²)(T_s + T_r).
 * @param Ts surface temperature, K
 * @param Tr radiant temperature of the surroundings, K
 * @param emissivity surface emissivity, 0…1
 * @example ε 1, T_s = T_r = 283.15 K → 5.15 W/m²K (ISO 6946 h_r0 at 10 °C: 5.1)
 * @see ISO 6946:2017, annex C (h_r = ε h_r0, h_r0 = 4σT_m³); Incropera et al., eq. 1.9.
 */
export function hRadiation(Ts: number, Tr: number, emissivity: number): number {
  return emissivity * SIGMA * (Ts * Ts + Tr * Tr) * (Ts + Tr);
}

/**
 * Clear-sky temperature, Swinbank: T_sky = 0.0552 T_air^1.5 (kelvin).
 * @param Tair screen-level air temperature, K
 * @example 268.15 K → 242.4 K (−30.8 °C)
 * @see W. C. Swinbank, "Long-wave radiation from clear skies", Q. J. R. Meteorol. Soc. 89 (1963)
 *   339–348.
 */
export function skyTemperatureSwinbank(Tair: number): number {
  return 0.0552 * Tair * Math.sqrt(Tair);
}

/**
 * Sky temperature under cloud cover c (0 clear … 1 overcast): T_sky⁴ = (1 − c)·T_clear⁴ + c·T_air⁴,
 * T_clear by Swinbank. An overcast sky radiates at about the air temperature (common practice;
 * no single source), so c = 0 is Swinbank's clear sky exactly and c = 1 the air temperature.
 * @param Tair screen-level air temperature, K
 * @param cloud cloud cover, fraction 0…1
 * @example 268.15 K, c 1 → 268.15 K; c 0 → 242.4 K
 * @see Swinbank (1963); Filmsheet calculation contract v2, `surface`.
 */
export function skyTemperatureCloudy(Tair: number, cloud: number): number {
  const Tc = skyTemperatureSwinbank(Tair);
  if (cloud === 0) return Tc;
  const c2 = Tc * Tc;
  const a2 = Tair * Tair;
  return Math.sqrt(Math.sqrt((1 - cloud) * c2 * c2 + cloud * a2 * a2));
}

/**
 * View factor from a tilted plane to the sky dome: F_sky = (1 + cos tilt)/2.
 * @param tiltDeg tilt from the horizontal, degrees (0 faces up)
 * @see J. A. Duffie, W. A. Beckman, Solar Engineering of Thermal Processes (4th ed.), §3.16.
  * @example tilt 90° → 0.5; tilt 35° → 0.910
 */
export function skyViewFactor(tiltDeg: number): number {
  return (1 + Math.cos((tiltDeg * Math.PI) / 180)) / 2;
}

/** Mean radiant temperature of sky and ground: T_r⁴ = F_sky T_sky⁴ + (1 − F_sky) T_ground⁴, K.  * @example F_sky 0.5, T_sky 242.4 K, T_ground 268.15 K → 256.2 K
 * @see Duffie & Beckman, Solar Engineering of Thermal Processes, §3.16 (view-factor weighting of sky and ground).
 */
export function radiantTemperature(Fsky: number, Tsky: number, Tground: number): number {
  const s2 = Tsky * Tsky;
  const g2 = Tground * Tground;
  return Math.sqrt(Math.sqrt(Fsky * s2 * s2 + (1 - Fsky) * g2 * g2));
}

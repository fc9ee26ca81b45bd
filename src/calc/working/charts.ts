/** Chart series of a working: local h along a plate, and h against wind speed. */
import { nuFlatPlateLaminarLocal, nuFlatPlateTurbulentLocal } from "../convection/forced-external";
import type { AirProperties } from "../properties/air";
import { newPlateCombinedState, plateCombinedInto } from "../select";
import type { LocalHPoint, WindPoint } from "./types";

/**
 * Local forced-convection h along a plate of length L at speed V, film properties: 0.332 Re_x^½
 * Pr^⅓ up to Re_crit (falling as x^−½), 0.0296 Re_x^0.8 Pr^⅓ beyond (the jump at transition).
 * Points are spaced evenly from L/n to L, with the two sides of the transition added.
 */
export function localHProfile(props: AirProperties, V: number, L: number, ReCrit: number, n = 60): LocalHPoint[] {
  if (!(V > 0)) return [];
  const xs: number[] = [];
  for (let i = 1; i <= n; i++) xs.push((L * i) / n);
  const xCrit = (ReCrit * props.nu_m2_s) / V;
  if (xCrit > 0 && xCrit < L) xs.push(xCrit, xCrit * (1 + 1e-9));
  xs.sort((a, b) => a - b);
  return xs.map((x) => {
    const Rex = (V * x) / props.nu_m2_s;
    const laminar = Rex <= ReCrit;
    const Nu = laminar ? nuFlatPlateLaminarLocal(Rex, props.Pr) : nuFlatPlateTurbulentLocal(Rex, props.Pr);
    return { x_m: x, h_W_m2K: (Nu * props.k_W_mK) / x, regime: laminar ? "laminar" : "turbulent" };
  });
}

/**
 * Forced, natural and combined h of a plate against wind speed 0…vMax, at a fixed surface and air
 * temperature (the row's computed ones) and the film properties there.
 */
export function hAgainstWind(
  props: AirProperties,
  Ts: number,
  Ta: number,
  L: number,
  tiltDeg: number,
  H: number,
  ReCrit: number,
  vMax = 15,
  step = 0.5,
): WindPoint[] {
  const st = newPlateCombinedState();
  const out: WindPoint[] = [];
  for (let V = 0; V <= vMax + 1e-9; V += step) {
    const h = plateCombinedInto(props, Ts, Ta, V, L, tiltDeg, H, ReCrit, st);
    out.push({
      V_m_s: Math.round(V * 1000) / 1000,
      h_forced_W_m2K: (st.NuF * props.k_W_mK) / L,
      h_natural_W_m2K: st.hN,
      h_combined_W_m2K: h,
    });
  }
  return out;
}

/** Moist-air saturation pressure and dew point (the ASHRAE formulas of Hyland & Wexler). */
import { T0 } from "../constants";

/** Triple point of water, °C: below and at it the ice formula applies. */
const TRIPLE_POINT_C = 0.01;

/**
 * Saturation vapour pressure over ice (T ≤ 0.01 °C) or liquid water (above), Hyland & Wexler:
 * ln p_ws = C1/T + C2 + C3 T + C4 T² + C5 T³ + C6 T⁴ + C7 ln T (ice),
 * ln p_ws = C8/T + C9 + C10 T + C11 T² + C12 T³ + C13 ln T (water).
 * @param T_C temperature, °C
 * @returns p_ws, Pa
 * Validity: −100…200 °C.
 * @example 20 °C → 2339 Pa
 * @see R. W. Hyland, A. Wexler, "Formulations for the thermodynamic properties of the saturated
 *   phases of H2O from 173.15 K to 473.15 K", ASHRAE Trans. 89(2A) (1983) 500–519; ASHRAE
 *   Handbook—Fundamentals (2017), ch. 1, eqs. 5–6; as implemented in psychrolib (Meyer & Thevenard,
 *   J. Open Source Softw. 4(33) 1137, 2019).
 */
export function saturationPressureHylandWexler(T_C: number): number {
  const T = T_C + T0;
  if (T_C <= TRIPLE_POINT_C) {
    return Math.exp(
      -5.6745359e3 / T +
        6.3925247 +
        T * (-9.677843e-3 + T * (6.2215701e-7 + T * (2.0747825e-9 + T * -9.484024e-13))) +
        4.1635019 * Math.log(T),
    );
  }
  return Math.exp(
    -5.8002206e3 / T +
      1.3914993 +
      T * (-4.8640239e-2 + T * (4.1764768e-5 + T * -1.4452093e-8)) +
      6.5459673 * Math.log(T),
  );
}

/** d(ln p_ws)/dT, 1/K, of the two Hyland & Wexler branches. */
function dLnPws(T_C: number): number {
  const T = T_C + T0;
  if (T_C <= TRIPLE_POINT_C) {
    return 5.6745359e3 / (T * T) - 9.677843e-3 + T * (2 * 6.2215701e-7 + T * (3 * 2.0747825e-9 + T * 4 * -9.484024e-13)) + 4.1635019 / T;
  }
  return 5.8002206e3 / (T * T) - 4.8640239e-2 + T * (2 * 4.1764768e-5 + T * 3 * -1.4452093e-8) + 6.5459673 / T;
}

/**
 * Dew (or frost) point of moist air from dry-bulb temperature and relative humidity: the
 * temperature at which p_ws equals the vapour pressure RH·p_ws(T), solved by Newton's method.
 * @param T_C dry-bulb temperature, °C
 * @param RH_pct relative humidity, % (0 < RH ≤ 100)
 * @returns dew point, °C
 * Validity: −100…200 °C.
 * @example 24 °C, 50 % → 12.95 °C (psychrolib 1.1.1)
 * @see ASHRAE Handbook—Fundamentals (2017), ch. 1; Hyland & Wexler (1983).
 */
export function dewPointHylandWexler(T_C: number, RH_pct: number): number {
  const lnPv = Math.log((RH_pct / 100) * saturationPressureHylandWexler(T_C));
  let t = T_C;
  for (let i = 0; i < 50; i++) {
    const step = (Math.log(saturationPressureHylandWexler(t)) - lnPv) / dLnPws(t);
    t = Math.min(200, Math.max(-100, t - step));
    if (Math.abs(step) < 1e-7) break;
  }
  return t;
}

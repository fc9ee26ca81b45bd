/** Heat exchange of a duct run with its surroundings: insulation resistance and leaving temperature. */

/**
 * Leaving-air temperature of a duct run with uniform UA per metre (exponential law):
 * T_L = T_env + (T_E − T_env) exp(−UA′ L / (ṁ c_p)).
 * @param TE entering air temperature, K (or °C; any consistent scale)
 * @param Tenv environment temperature the air tends to, same scale
 * @param UAperM overall conductance per metre of run, W/(m·K)
 * @param L run length, m
 * @param mdot mass flow, kg/s (density at the entering temperature)
 * @param cp specific heat at the mean air temperature, J/(kg·K)
 * @example TE 13 °C, Tenv 35 °C, UA′ 2.23 W/mK, L 30 m, ṁ 1.47 kg/s, cp 1006 → 13.97 °C
 * @see ASHRAE Handbook—Fundamentals (2017), ch. 21 "Duct design", duct heat gain/loss equation;
 *   Incropera et al., Fundamentals of Heat and Mass Transfer, eq. 8.46a (constant surroundings).
 */
export function leavingAirTemperature(TE: number, Tenv: number, UAperM: number, L: number, mdot: number, cp: number): number {
  return Tenv + (TE - Tenv) * Math.exp((-UAperM * L) / (mdot * cp));
}

/**
 * Thermal resistance per metre of a cylindrical insulation layer: ln(D_o/D_i)/(2πk).
 * @param Di inner diameter, m
 * @param Do outer diameter, m
 * @param k conductivity of the insulation, W/(m·K)
 * @see Incropera et al., Fundamentals of Heat and Mass Transfer, eq. 3.33.
  * @example D_i 0.5 m, D_o 0.55 m, k 0.04 W/mK → ln(1.1)/(2π·0.04) = 0.379 m·K/W
 */
export function insulationResistanceRound(Di: number, Do: number, k: number): number {
  return Do > Di ? Math.log(Do / Di) / (2 * Math.PI * k) : 0;
}

/**
 * Thermal resistance per metre of insulation on a rectangular duct, on the mean perimeter:
 * t / (k (P_i + P_o)/2).
 * @param t thickness, m
 * @param Pi inner (duct) perimeter, m
 * @param Po outer (jacket) perimeter, m
 * @param k conductivity of the insulation, W/(m·K)
 * @see common practice (mean-area approximation for thin layers on flat sides).
  * @example t 25 mm, P_i 1.8 m, P_o 2.0 m, k 0.035 W/mK → 0.025/(0.035·1.9) = 0.376 m·K/W
 */
export function insulationResistanceRect(t: number, Pi: number, Po: number, k: number): number {
  return t > 0 ? t / ((k * (Pi + Po)) / 2) : 0;
}

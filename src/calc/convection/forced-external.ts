/**
 * Forced convection over external bodies: flat plate (average and local), cylinder and sphere in
 * cross-flow. Each function returns a Nusselt number only; property evaluation, method selection
 * and validity warnings live in the callers (src/calc/kinds) and the registry.
 */

let lastReCrit = NaN;
let lastA = NaN;

/** A of the mixed-boundary-layer average: 0.037 Re_c^0.8 − 0.664 Re_c^½ (871 for Re_c = 5×10^5). */
export function mixedBoundaryLayerA(ReCrit: number): number {
  // Re_c rarely changes between calls (5×10^5 by default), so the last value is kept.
  if (ReCrit !== lastReCrit) {
    lastA = 0.037 * Math.pow(ReCrit, 0.8) - 0.664 * Math.sqrt(ReCrit);
    lastReCrit = ReCrit;
  }
  return lastA;
}

/**
 * Average Nusselt number of a laminar flat plate, isothermal: Nu_L = 0.664 Re_L^½ Pr^⅓.
 * @param Re Reynolds number on the plate length L (properties at the film temperature)
 * @param Pr Prandtl number at the film temperature
 * Validity: Re_L ≤ Re_crit (5×10^5 by default), Pr ≥ 0.6.
 * @example Re 31 152, Pr 0.7071 → Nu 104.4 (0.664·176.5·0.8909)
 * @see H. Blasius (1908) similarity solution as correlated by E. Pohlhausen, Z. angew. Math. Mech.
 *   1 (1921) 115–121; Incropera et al., Fundamentals of Heat and Mass Transfer, eq. 7.30.
 */
export function nuFlatPlateLaminarAverage(Re: number, Pr: number): number {
  return 0.664 * Math.sqrt(Re) * Math.cbrt(Pr);
}

/**
 * Average Nusselt number of a plate with a laminar leading part and a turbulent rest:
 * Nu_L = (0.037 Re_L^0.8 − A) Pr^⅓, A = 0.037 Re_c^0.8 − 0.664 Re_c^½. With Re_c = 0 (tripped at the
 * leading edge) A = 0 and the plate is turbulent throughout.
 * @param Re Reynolds number on the plate length L (film temperature)
 * @param Pr Prandtl number (film temperature)
 * @param ReCrit critical Reynolds number of transition (5×10^5 by default)
 * Validity: Re_c < Re_L ≤ 10^8, 0.6 ≤ Pr ≤ 60.
 * @example Re 9.921×10^5, Pr 0.7085, Re_c 5×10^5 → Nu 1291
 * @see Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer (6th ed.),
 *   eqs. 7.38–7.41; turbulent local law from Schlichting, Boundary-Layer Theory.
 */
export function nuFlatPlateMixedAverage(Re: number, Pr: number, ReCrit: number): number {
  return (0.037 * Math.pow(Re, 0.8) - mixedBoundaryLayerA(ReCrit)) * Math.cbrt(Pr);
}

/**
 * Local Nusselt number of a laminar flat plate at x: Nu_x = 0.332 Re_x^½ Pr^⅓ (h falls as x^−½).
 * @param Rex Reynolds number on the distance x from the leading edge (film temperature)
 * @param Pr Prandtl number (film temperature)
 * Validity: Re_x ≤ Re_crit, Pr ≥ 0.6.
 * @example Re_x 15 576, Pr 0.7071 → Nu_x 36.9
 * @see Incropera et al., Fundamentals of Heat and Mass Transfer, eq. 7.23.
 */
export function nuFlatPlateLaminarLocal(Rex: number, Pr: number): number {
  return 0.332 * Math.sqrt(Rex) * Math.cbrt(Pr);
}

/**
 * Local Nusselt number of a turbulent flat plate at x: Nu_x = 0.0296 Re_x^0.8 Pr^⅓.
 * @param Rex Reynolds number on x (film temperature)
 * @param Pr Prandtl number (film temperature)
 * Validity: Re_crit < Re_x ≤ 10^8, 0.6 ≤ Pr ≤ 60.
 * @example Re_x 2.215×10^7, Pr 0.711 → Nu_x 19 871
 * @see Incropera et al., Fundamentals of Heat and Mass Transfer, eq. 7.36 (Colburn analogy).
 */
export function nuFlatPlateTurbulentLocal(Rex: number, Pr: number): number {
  return 0.0296 * Math.pow(Rex, 0.8) * Math.cbrt(Pr);
}

/**
 * Cylinder in cross-flow, Churchill & Bernstein:
 * Nu_D = 0.3 + 0.62 Re^½ Pr^⅓ / [1 + (0.4/Pr)^⅔]^¼ · [1 + (Re/282 000)^⅝]^⅘.
 * @param Re Reynolds number on the diameter (film temperature)
 * @param Pr Prandtl number (film temperature)
 * Validity: Re·Pr ≥ 0.2.
 * @example Re 5 882, Pr 0.7059 → Nu 40.1
 * @see S. W. Churchill, M. Bernstein, "A correlating equation for forced convection from gases and
 *   liquids to a circular cylinder in crossflow", J. Heat Transfer 99 (1977) 300–306.
 */
export function nuCylinderCrossflowChurchillBernstein(Re: number, Pr: number): number {
  const a = (0.62 * Math.sqrt(Re) * Math.cbrt(Pr)) / Math.pow(1 + Math.pow(0.4 / Pr, 2 / 3), 0.25);
  return 0.3 + a * Math.pow(1 + Math.pow(Re / 282000, 5 / 8), 4 / 5);
}

/**
 * Sphere in a gas or liquid stream, Whitaker:
 * Nu_D = 2 + (0.4 Re^½ + 0.06 Re^⅔) Pr^0.4 (μ/μ_s)^¼.
 * @param Re Reynolds number on the diameter (properties at the free-stream air temperature)
 * @param Pr Prandtl number (air temperature)
 * @param muRatio μ at the air temperature / μ_s at the surface temperature
 * Validity: 3.5 ≤ Re ≤ 7.6×10^4, 0.71 ≤ Pr ≤ 380, 1 ≤ μ/μ_s ≤ 3.2.
 * @example Re 17 645, Pr 0.7059, μ/μ_s 1.06 → Nu 84.7
 * @see S. Whitaker, "Forced convection heat transfer correlations for flow in pipes, past flat
 *   plates, single cylinders, single spheres, and for flow in packed beds and tube bundles",
 *   AIChE J. 18 (1972) 361–371.
 */
export function nuSphereForcedWhitaker(Re: number, Pr: number, muRatio: number): number {
  return 2 + (0.4 * Math.sqrt(Re) + 0.06 * Math.pow(Re, 2 / 3)) * Math.pow(Pr, 0.4) * Math.pow(muRatio, 0.25);
}

/** Convection and friction inside ducts. */


/**
 * Fully developed laminar flow in a rectangular duct at constant wall temperature, Shah & London:
 * Nu_T = 7.541(1 − 2.610α + 4.970α² − 5.119α³ + 2.702α⁴ − 0.548α⁵).
 * @param alpha aspect ratio, short side / long side (0 < α ≤ 1)
 * Validity: Re < 2300, fully developed.
 * @example α 0.5 → 3.39; α 1 → 2.98
 * @see R. K. Shah, A. L. London, Laminar Flow Forced Convection in Ducts, Academic Press (1978).
 */
export function nuRectangularLaminarShahLondon(alpha: number): number {
  const a = alpha;
  return 7.541 * (1 - 2.61 * a + 4.97 * a * a - 5.119 * a ** 3 + 2.702 * a ** 4 - 0.548 * a ** 5);
}

/**
 * Laminar friction constant of a rectangular duct, Shah & London:
 * f·Re (Darcy) = 96(1 − 1.3553α + 1.9467α² − 1.7012α³ + 0.9564α⁴ − 0.2537α⁵).
 * @param alpha aspect ratio, short side / long side
 * @example α 1 → 56.9
 * @see R. K. Shah, A. L. London, Laminar Flow Forced Convection in Ducts, Academic Press (1978).
 */
export function fReRectangularShahLondon(alpha: number): number {
  const a = alpha;
  return 96 * (1 - 1.3553 * a + 1.9467 * a * a - 1.7012 * a ** 3 + 0.9564 * a ** 4 - 0.2537 * a ** 5);
}

/**
 * Petukhov's smooth-tube friction factor (Darcy): f = (0.790 ln Re − 1.64)^−2.
 * @param Re Reynolds number on the hydraulic diameter (bulk temperature)
 * Validity: 3000 ≤ Re ≤ 5×10^6.
 * @example Re 10^5 → 0.0180
 * @see B. S. Petukhov, "Heat transfer and friction in turbulent pipe flow with variable physical
 *   properties", Adv. Heat Transfer 6 (1970) 503–564.
 */
export function fDarcyPetukhov(Re: number): number {
  const d = 0.79 * Math.log(Re) - 1.64;
  return 1 / (d * d);
}

/**
 * Gnielinski: Nu = (f/8)(Re − 1000)Pr / [1 + 12.7 (f/8)^½ (Pr^⅔ − 1)] with Petukhov's f.
 * @param Re Reynolds number on the hydraulic diameter (bulk temperature)
 * @param Pr Prandtl number (bulk temperature)
 * Validity: 3000 ≤ Re ≤ 5×10^6, 0.5 ≤ Pr ≤ 2000.
 * @example Re 10^5, Pr 0.7085 → Nu 180.0
 * @see V. Gnielinski, "New equations for heat and mass transfer in turbulent pipe and channel
 *   flow", Int. Chem. Eng. 16 (1976) 359–368.
 */
export function nuDuctTurbulentGnielinski(Re: number, Pr: number): number {
  const f8 = fDarcyPetukhov(Re) / 8;
  return (f8 * (Re - 1000) * Pr) / (1 + 12.7 * Math.sqrt(f8) * (Math.pow(Pr, 2 / 3) - 1));
}

/**
 * Colebrook–White friction factor (Darcy), solved by Newton's method on 1/√f:
 * 1/√f = −2 log10(ε/(3.7 D) + 2.51/(Re √f)).
 * @param Re Reynolds number on the hydraulic diameter
 * @param relRoughness ε/D_h
 * Validity: turbulent flow, Re ≥ 3000 (the engine blends from 2300).
 * @example Re 10^5, ε/D 2.25×10^−4 → 0.01912 (python3-fluids 1.0.22 Colebrook)
 * @see C. F. Colebrook, "Turbulent flow in pipes, with particular reference to the transition region
 *   between the smooth and rough pipe laws", J. Inst. Civ. Eng. 11 (1939) 133–156.
 */
export function fDarcyColebrook(Re: number, relRoughness: number): number {
  const a = relRoughness / 3.7;
  const b = 2.51 / Re;
  // Start from Swamee–Jain, then Newton on x = 1/√f: g(x) = x + 2 log10(a + b x) = 0.
  const sj = 0.25 / Math.pow(Math.log10(a + 5.74 / Math.pow(Re, 0.9)), 2);
  let x = 1 / Math.sqrt(sj);
  const c = 2 / Math.LN10;
  for (let i = 0; i < 20; i++) {
    const inner = a + b * x;
    const g = x + c * Math.log(inner);
    const dg = 1 + (c * b) / inner;
    const dx = g / dg;
    x -= dx;
    if (Math.abs(dx) < 1e-12 * x) break;
  }
  return 1 / (x * x);
}

/**
 * Fully developed laminar flow in a round duct at constant wall temperature: Nu = 3.66.
 * Validity: Re < 2300, fully developed.
 * @see W. M. Kays, M. E. Crawford, Convective Heat and Mass Transfer; Incropera et al., eq. 8.55.
 */
export function nuRoundDuctLaminar(): number {
  return 3.66;
}

/**
 * Linear blend between two values across the transitional band of Reynolds numbers.
 * @param Re Reynolds number
 * @param ReLow start of the band (2300), where the value is `low`
 * @param ReHigh end of the band (3000), where the value is `high`
 * @see common practice in ducts between laminar and Gnielinski ranges (e.g. Gnielinski, Int. J.
 *   Heat Mass Transfer 2013, who interpolates across 2300…10^4).
 */
export function blendLinear(Re: number, ReLow: number, ReHigh: number, low: number, high: number): number {
  const w = (Re - ReLow) / (ReHigh - ReLow);
  return low + w * (high - low);
}

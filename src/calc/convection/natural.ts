/**
 * Natural (buoyant) convection: plates at any tilt, horizontal cylinder, sphere. Each function
 * returns a Nusselt number; the Rayleigh number passed in is computed by the caller with the
 * appropriate component of gravity (see src/calc/kinds/plate-natural.ts).
 */

/**
 * Vertical plate, Churchill & Chu full form (laminar and turbulent):
 * Nu_L = {0.825 + 0.387 Ra^⅙ / [1 + (0.492/Pr)^(9/16)]^(8/27)}².
 * @param Ra Rayleigh number on the plate height (film temperature); g·cos θ for inclined plates
 * @param Pr Prandtl number (film temperature)
 * Validity: Ra ≤ 10^12, all Pr.
 * @example Ra 4.795×10^7, Pr 0.7071 → Nu 49.1
 * @see S. W. Churchill, H. H. S. Chu, "Correlating equations for laminar and turbulent free
 *   convection from a vertical plate", Int. J. Heat Mass Transfer 18 (1975) 1323–1329.
 */
export function nuVerticalPlateChurchillChu(Ra: number, Pr: number): number {
  const s = 0.825 + (0.387 * Math.sqrt(Math.cbrt(Ra))) * prandtlFactor(0.492, Pr);
  return s * s;
}

/**
 * [1 + (c/Pr)^(9/16)]^(−8/27), the Prandtl function of the Churchill & Chu forms, written with
 * roots (x^(9/16) = (x^(1/16))⁹, y^(8/27) = (y^(1/27))⁸) because it is on the engine's hot path.
 */
function prandtlFactor(c: number, Pr: number): number {
  const r16 = Math.sqrt(Math.sqrt(Math.sqrt(Math.sqrt(c / Pr))));
  const r8 = r16 * r16 * r16 * r16 * r16 * r16 * r16 * r16;
  const y = 1 + r8 * r16;
  const c27 = Math.cbrt(Math.cbrt(Math.cbrt(y)));
  const c2 = c27 * c27;
  const c4 = c2 * c2;
  return 1 / (c4 * c4);
}

/**
 * Horizontal plate, unstable side (hot facing up or cold facing down), laminar branch:
 * Nu_L = 0.54 Ra^¼, L = area/perimeter.
 * @param Ra Rayleigh number on L = A/P (film temperature)
 * Validity: 10^4 ≤ Ra ≤ 10^7, Pr ≥ 0.7.
 * @example Ra 6.635×10^6 → Nu 27.4
 * @see J. R. Lloyd, W. R. Moran, "Natural convection adjacent to horizontal surface of various
 *   planforms", J. Heat Transfer 96 (1974) 443–447; Incropera et al., eq. 9.30.
 */
export function nuHorizontalPlateUnstableLaminar(Ra: number): number {
  return 0.54 * Math.pow(Ra, 0.25);
}

/**
 * Horizontal plate, unstable side, turbulent branch: Nu_L = 0.15 Ra^⅓, L = area/perimeter.
 * @param Ra Rayleigh number on L = A/P (film temperature)
 * Validity: 10^7 < Ra ≤ 10^11, all Pr.
 * @example Ra 1.912×10^8 → Nu 86.4
 * @see Lloyd & Moran (1974), J. Heat Transfer 96, 443–447; Incropera et al., eq. 9.31.
 */
export function nuHorizontalPlateUnstableTurbulent(Ra: number): number {
  return 0.15 * Math.cbrt(Ra);
}

/**
 * Horizontal plate, stable side (hot facing down or cold facing up): Nu_L = 0.52 Ra^⅕.
 * @param Ra Rayleigh number on L = A/P (film temperature), full g
 * Validity: 10^4 ≤ Ra ≤ 10^9, Pr ≥ 0.7.
 * @example Ra 9.448×10^6 → Nu 12.9
 * @see W. M. Rohsenow, J. P. Hartnett, Y. I. Cho (eds.), Handbook of Heat Transfer (3rd ed.,
 *   1998), ch. 4 (Raithby & Hollands); Incropera et al. (7th ed.), eq. 9.32.
 */
export function nuHorizontalPlateStable(Ra: number): number {
  return 0.52 * Math.pow(Ra, 0.2);
}

/**
 * Long horizontal cylinder, Churchill & Chu:
 * Nu_D = {0.60 + 0.387 Ra^⅙ / [1 + (0.559/Pr)^(9/16)]^(8/27)}².
 * @param Ra Rayleigh number on the diameter (film temperature)
 * @param Pr Prandtl number (film temperature)
 * Validity: Ra ≤ 10^12.
 * @example Ra 7.962×10^7, Pr 0.7085 → Nu 52.7
 * @see S. W. Churchill, H. H. S. Chu, "Correlating equations for laminar and turbulent free
 *   convection from a horizontal cylinder", Int. J. Heat Mass Transfer 18 (1975) 1049–1053.
 */
export function nuHorizontalCylinderChurchillChu(Ra: number, Pr: number): number {
  const s = 0.6 + (0.387 * Math.sqrt(Math.cbrt(Ra))) * prandtlFactor(0.559, Pr);
  return s * s;
}

/**
 * Sphere, Churchill: Nu_D = 2 + 0.589 Ra^¼ / [1 + (0.469/Pr)^(9/16)]^(4/9).
 * @param Ra Rayleigh number on the diameter (film temperature)
 * @param Pr Prandtl number (film temperature)
 * Validity: Ra ≤ 10^11, Pr ≥ 0.7.
 * @example Ra 8.259×10^7, Pr 0.7059 → Nu 45.3
 * @see S. W. Churchill, "Free convection around immersed bodies", ch. 2.5.7 in Heat Exchanger
 *   Design Handbook, Hemisphere (1983).
 */
export function nuSphereNaturalChurchill(Ra: number, Pr: number): number {
  return 2 + (0.589 * Math.pow(Ra, 0.25)) / Math.pow(1 + Math.pow(0.469 / Pr, 9 / 16), 4 / 9);
}

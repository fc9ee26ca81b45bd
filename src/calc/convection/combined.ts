/** Combined forced and natural convection. */

/**
 * Churchill's combination of forced and natural convection (assisting or transverse flow):
 * Nu^n = Nu_F^n + Nu_N^n, both on the same characteristic length.
 * @param NuF forced-convection Nusselt number
 * @param NuN natural-convection Nusselt number, rescaled to the forced length
 * @param n exponent: 3 for plates, 4 for cylinders and spheres
 * Validity: as the two parts.
 * @example NuF 255.8, NuN 332.7, n 3 → Nu 376.9
 * @see S. W. Churchill, "A comprehensive correlating equation for laminar, assisting, forced and
 *   free convection", AIChE J. 23 (1977) 10–16.
 */
export function nuCombinedChurchill(NuF: number, NuN: number, n: number): number {
  if (n === 3) return Math.cbrt(NuF * NuF * NuF + NuN * NuN * NuN);
  if (n === 4) return Math.sqrt(Math.sqrt(NuF ** 4 + NuN ** 4));
  return Math.pow(Math.pow(NuF, n) + Math.pow(NuN, n), 1 / n);
}

/** Regime word from the Richardson number Gr/Re²: forced ≤ 0.1 < combined ≤ 10 < natural. */
export function regimeFromRichardson(Ri: number | null): "forced" | "natural" | "combined" {
  if (Ri === null) return "natural";
  if (Ri <= 0.1) return "forced";
  if (Ri <= 10) return "combined";
  return "natural";
}

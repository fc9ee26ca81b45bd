/**
 * Safeguarded fixed-point solver for the engine's energy balances. Each balance is written as
 * x = next(x), where next() is the linearised balance with its coefficients taken at x; the
 * residual next(x) − x falls monotonically through its root, which lies in [lo, hi]. Secant steps
 * on the residual accelerate the plain iteration; bisection takes over when a step leaves the
 * bracket, so the solve always ends.
 */
export interface Solved {
  x: number;
  iterations: number;
  converged: boolean;
}

export function solveFixedPoint(
  next: (x: number) => number,
  lo: number,
  hi: number,
  x0: number,
  tol: number,
  maxIter = 200,
): Solved {
  let x = Math.min(hi, Math.max(lo, x0));
  let prevX = NaN;
  let prevG = NaN;
  for (let i = 1; i <= maxIter; i++) {
    const fx = next(x);
    const g = fx - x;
    if (Math.abs(g) < tol) return { x: fx, iterations: i, converged: true };
    if (g > 0) lo = Math.max(lo, x);
    else hi = Math.min(hi, x);
    let xn = fx;
    if (prevG === prevG && g !== prevG) {
      const sec = x - (g * (x - prevX)) / (g - prevG);
      if (sec > lo && sec < hi) xn = sec;
    }
    if (!(xn > lo && xn < hi)) xn = (lo + hi) / 2;
    if (hi - lo < tol) return { x: (lo + hi) / 2, iterations: i, converged: true };
    prevX = x;
    prevG = g;
    x = xn;
  }
  return { x, iterations: maxIter, converged: false };
}

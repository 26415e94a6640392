/**
 * Bisection on a bracketed sign change: robust for the piecewise polynomials of beam analysis, where the
 * slope and shear are continuous inside a segment. Tolerance is relative to the bracket's scale.
 *
 * @param f function of x (any unit)
 * @param lo lower bracket, same unit as x
 * @param hi upper bracket; f(lo) and f(hi) must differ in sign (or one be zero)
 * @param relTol stopping width as a fraction of max(|lo|, |hi|, hi − lo); default 1e-12 (brief asks 1e-9)
 * @returns x with f(x) ≈ 0, same unit as lo and hi
 * @example
 * findRoot((x) => x * x - 2, 0, 2); // 1.41421356...
 *
 * Reference: R. L. Burden and J. D. Faires, Numerical Analysis, §2.1 "The Bisection Method".
 */
export function findRoot(f: (x: number) => number, lo: number, hi: number, relTol = 1e-12): number {
  let a = lo;
  let b = hi;
  let fa = f(a);
  if (fa === 0) return a;
  if (f(b) === 0) return b;
  const stop = relTol * Math.max(Math.abs(lo), Math.abs(hi), hi - lo);
  while (b - a > stop) {
    const mid = 0.5 * (a + b);
    const fm = f(mid);
    if (fm === 0) return mid;
    if (fm > 0 === fa > 0) {
      a = mid;
      fa = fm;
    } else {
      b = mid;
    }
  }
  return 0.5 * (a + b);
}

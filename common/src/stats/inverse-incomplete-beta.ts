import { incompleteBeta } from './incomplete-beta';
import { logBeta } from './log-beta';

/**
 * The x in [0, 1] with I_x(a, b) = p. Safeguarded Newton iteration (Newton steps with a bisection
 * bracket, in the manner of Numerical Recipes 3rd ed. §9.4 rtsafe), using the density
 * dI/dx = x^(a−1)(1−x)^(b−1)/B(a,b). Converges to relative precision even for tiny x.
 */
export function inverseIncompleteBeta(p: number, a: number, b: number): number {
  if (!(p >= 0) || !(p <= 1) || !(a > 0) || !(b > 0)) return NaN;
  if (p === 0) return 0;
  if (p === 1) return 1;
  const lnB = logBeta(a, b);
  let lo = 0;
  let hi = 1;
  let x = 0.5;
  for (let iter = 0; iter < 300; iter++) {
    const f = incompleteBeta(a, b, x) - p;
    if (f === 0) return x;
    if (f < 0) lo = x;
    else hi = x;
    const density = Math.exp((a - 1) * Math.log(x) + (b - 1) * Math.log1p(-x) - lnB);
    let next = x - f / density;
    // Outside the bracket (or no usable slope): bisect; geometric when the bracket touches 0
    // so tiny roots (t quantiles far in the tail) are reached in few steps.
    if (!(next > lo && next < hi)) next = lo === 0 ? hi * 0.0625 : (lo + hi) / 2;
    if (Math.abs(next - x) <= 1e-15 * x) return next;
    x = next;
  }
  return x;
}

import { incompleteBeta } from './incomplete-beta';
import { inverseIncompleteBeta } from './inverse-incomplete-beta';

/**
 * Cumulative distribution function of Student's t with `dof` > 0 degrees of freedom (need not be
 * an integer), via P(|T| > |t|) = I_{ν/(ν+t²)}(ν/2, 1/2) (Abramowitz & Stegun 26.7.1 with 26.5.27).
 */
export function studentTCdf(t: number, dof: number): number {
  if (Number.isNaN(t) || !(dof > 0)) return NaN;
  const tail = 0.5 * studentTTwoSidedP(t, dof);
  return t > 0 ? 1 - tail : tail;
}

/** Two-sided p-value P(|T| ≥ |t|) for Student's t with `dof` degrees of freedom. */
export function studentTTwoSidedP(t: number, dof: number): number {
  if (Number.isNaN(t) || !(dof > 0)) return NaN;
  if (!Number.isFinite(t)) return 0;
  const t2 = t * t;
  // Pass both x and 1 − x, each computed without cancellation.
  return incompleteBeta(dof / 2, 0.5, dof / (dof + t2), t2 / (dof + t2));
}

/**
 * Quantile of Student's t: the t with studentTCdf(t, dof) = p, 0 < p < 1, by inverting the
 * incomplete beta relation above. E.g. studentTQuantile(0.975, 10) ≈ 2.228.
 */
export function studentTQuantile(p: number, dof: number): number {
  if (!(p > 0) || !(p < 1) || !(dof > 0)) return p === 0 ? -Infinity : p === 1 ? Infinity : NaN;
  if (p === 0.5) return 0;
  const tailArea = p < 0.5 ? 2 * p : 2 * (1 - p);
  const x = inverseIncompleteBeta(tailArea, dof / 2, 0.5);
  const t = Math.sqrt((dof * (1 - x)) / x);
  return p < 0.5 ? -t : t;
}

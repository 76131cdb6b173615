import { inverseIncompleteBeta } from './inverse-incomplete-beta';

/**
 * The |r| at which the two-sided p-value of correlationPValue equals alpha for nEff effective pairs:
 * p = I_{1−r²}(ν/2, 1/2) with ν = nEff − 2, so r = √(1 − x) where I_x(ν/2, 1/2) = alpha.
 * Figures draw ±threshold as the significance band. null when nEff ≤ 2 or alpha is not in (0, 1).
 */
export function significanceThreshold(nEff: number, alpha: number): number | null {
  if (!(nEff > 2) || !(alpha > 0) || !(alpha < 1)) return null;
  const x = inverseIncompleteBeta(alpha, (nEff - 2) / 2, 0.5);
  return Math.sqrt(1 - x);
}

import { incompleteBeta } from './incomplete-beta';

/**
 * Two-sided p-value of a correlation r from `nEff` (effective) pairs: t = r·√((nEff−2)/(1−r²)) with
 * nEff − 2 degrees of freedom (e.g. Wilks, Statistical Methods in the Atmospheric Sciences, §5.2).
 * Evaluated directly as I_{1−r²}((nEff−2)/2, 1/2), since ν/(ν+t²) = 1 − r², with 1 − r² formed as
 * (1−r)(1+r) to keep precision for r near ±1. null when r is null or nEff ≤ 2.
 */
export function correlationPValue(r: number | null, nEff: number | null): number | null {
  if (r === null || nEff === null || !Number.isFinite(r) || !(nEff > 2)) return null;
  const ar = Math.min(1, Math.abs(r));
  if (ar === 1) return 0;
  const dof = nEff - 2;
  return incompleteBeta(dof / 2, 0.5, (1 - ar) * (1 + ar), ar * ar);
}

/** The t statistic r·√((n−2)/(1−r²)) of a correlation; null when undefined (n ≤ 2 or |r| = 1). */
export function correlationT(r: number, n: number): number | null {
  if (!(n > 2) || !(Math.abs(r) < 1)) return null;
  return r * Math.sqrt((n - 2) / ((1 - r) * (1 + r)));
}

import { benjaminiHochberg } from './benjamini-hochberg';

/** Which cells of a map are significant, and how many before and after FDR control. */
export interface FieldSignificance {
  /** Per cell: passes Benjamini–Hochberg at α_FDR. */
  significant: Uint8Array;
  alpha: number;
  alphaFdr: number;
  tested: number;
  /** Cells with p ≤ α tested one at a time (pointwise), and cells passing the FDR control. */
  pointwise: number;
  fdr: number;
}

/**
 * Field significance of a map of per-cell p-values: Benjamini–Hochberg FDR control across the
 * cells at α_FDR = 2α, as Wilks (2016), "The stippling shows statistically significant grid
 * points", BAMS 97(12):2263–2273, recommends for spatially correlated fields (it keeps the global
 * test level near α). Reports the pointwise count too, which overstates significance.
 */
export function fieldSignificance(p: ArrayLike<number>, alpha = 0.05): FieldSignificance {
  const alphaFdr = Math.min(1, 2 * alpha);
  const bh = benjaminiHochberg(p, alphaFdr);
  let pointwise = 0;
  let fdr = 0;
  for (let i = 0; i < p.length; i++) {
    if (p[i] <= alpha) pointwise++;
    fdr += bh.significant[i];
  }
  return { significant: bh.significant, alpha, alphaFdr, tested: bh.tested, pointwise, fdr };
}

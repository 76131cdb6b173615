/** Correlation of two series' anomalies at lags −maxLag..+maxLag, with the |r| needed for significance at each lag. */
import { z } from 'zod';
import { DEFAULT_SURROGATE_SEED, DEFAULT_SURROGATES } from '../../stats/lag-correlation';
import { defineFigureKind } from '../kind';
import { anomalyField, seriesBindingSchema } from '../shared/recipe-parts';
import { nullableNumber } from '../shared/result-parts';
import { lagCorrelationSpec } from './spec';

/**
 * Largest |lag| of a figure, in months. The figure route has accepted 60 since it was written (the
 * engine's own route allows 120, MAX_LAG_MONTHS); kept so that no stored recipe changes meaning.
 */
export const FIGURE_MAX_LAG = 60;

/** Most phase-randomised surrogates a figure draws (the analysis route's MAX_SURROGATES). */
export const FIGURE_MAX_SURROGATES = 10_000;

/** Recipe of a lag-correlation figure. */
export const lagCorrelationRecipeSchema = z.strictObject({
  kind: z.literal('lag-correlation'),
  index: seriesBindingSchema,
  series: seriesBindingSchema,
  anomaly: anomalyField(),
  maxLag: z.number().int().min(0).max(FIGURE_MAX_LAG).default(24),
  method: z.enum(['pearson', 'spearman']).default('pearson'),
  alpha: z.number().gt(0).lt(0.5).default(0.05),
  /** Per-lag test: t test with nEff ("ar1") or phase-randomised surrogates (Ebisuzaki 1997, J. Climate). */
  significance: z.enum(['ar1', 'phase-randomised']).default('ar1'),
  /** Surrogates for the strongest lag's search-corrected p (pSearch); 0 draws none. */
  surrogates: z.number().int().min(0).max(FIGURE_MAX_SURROGATES).default(DEFAULT_SURROGATES),
  /** Seed of the surrogates, fixed so that a figure repeats. */
  seed: z.number().int().default(DEFAULT_SURROGATE_SEED),
});

/** One lag: the engine's row (LagCorrelationRow; the server's compute checks it `satisfies` this) with the |r| needed for significance at alpha. */
export const lagRowSchema = z.object({ lag: z.number(), r: nullableNumber(), n: z.number(), nEff: nullableNumber(), p: nullableNumber(), threshold: nullableNumber() });
export type LagRow = z.output<typeof lagRowSchema>;

/** `data` of a lag-correlation figure (positive lag: the index leads the series). */
export const lagCorrelationResultSchema = z.object({
  method: z.enum(['pearson', 'spearman']),
  alpha: z.number(),
  lags: z.array(lagRowSchema),
  /** pSearch: the strongest lag's p corrected for the search over lags; absent in results stored before issue 14. */
  strongest: lagRowSchema.extend({ pSearch: nullableNumber().optional() }).nullable(),
});
export type LagCorrelationData = z.output<typeof lagCorrelationResultSchema>;

/** The lag-correlation kind. */
export const lagCorrelationKind = defineFigureKind({
  kind: 'lag-correlation',
  label: 'Lagged correlation',
  recipe: lagCorrelationRecipeSchema,
  skeleton: { index: { seriesId: '', version: 'latest' }, series: { seriesId: '', version: 'latest' } },
  result: lagCorrelationResultSchema,
  spec: lagCorrelationSpec,
  table: (d) => ({ header: ['lag', 'r', 'n', 'n_eff', 'p', 'threshold'], rows: d.lags.map((l) => [l.lag, l.r, l.n, l.nEff, l.p, l.threshold]) }),
});

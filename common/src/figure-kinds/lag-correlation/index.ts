/** Correlation of two series' anomalies at lags −maxLag..+maxLag, with the |r| needed for significance at each lag. */
import { z } from 'zod';
import { defineFigureKind } from '../kind';
import { anomalyField, seriesBindingSchema } from '../shared/recipe-parts';
import { nullableNumber } from '../shared/result-parts';
import { lagCorrelationSpec } from './spec';

/**
 * Largest |lag| of a figure, in months. The figure route has accepted 60 since it was written (the
 * engine's own route allows 120, MAX_LAG_MONTHS); kept so that no stored recipe changes meaning.
 */
export const FIGURE_MAX_LAG = 60;

/** Recipe of a lag-correlation figure. */
export const lagCorrelationRecipeSchema = z.strictObject({
  kind: z.literal('lag-correlation'),
  index: seriesBindingSchema,
  series: seriesBindingSchema,
  anomaly: anomalyField(),
  maxLag: z.number().int().min(0).max(FIGURE_MAX_LAG).default(24),
  method: z.enum(['pearson', 'spearman']).default('pearson'),
  alpha: z.number().gt(0).lt(0.5).default(0.05),
});

/** One lag: the engine's row (LagCorrelationRow; the server's compute checks it `satisfies` this) with the |r| needed for significance at alpha. */
export const lagRowSchema = z.object({ lag: z.number(), r: nullableNumber(), n: z.number(), nEff: nullableNumber(), p: nullableNumber(), threshold: nullableNumber() });
export type LagRow = z.output<typeof lagRowSchema>;

/** `data` of a lag-correlation figure (positive lag: the index leads the series). */
export const lagCorrelationResultSchema = z.object({
  method: z.enum(['pearson', 'spearman']),
  alpha: z.number(),
  lags: z.array(lagRowSchema),
  strongest: lagRowSchema.nullable(),
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

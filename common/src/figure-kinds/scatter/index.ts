/** Index anomaly against a series anomaly some months later, one point per month, with the least-squares line. */
import { z } from 'zod';
import { defineFigureKind } from '../kind';
import { FIGURE_MAX_LAG } from '../lag-correlation';
import { anomalyField, seriesBindingSchema } from '../shared/recipe-parts';
import { nullableNumber } from '../shared/result-parts';
import { scatterSpec } from './spec';

/** Recipe of a scatter figure. */
export const scatterRecipeSchema = z.strictObject({
  kind: z.literal('scatter'),
  index: seriesBindingSchema,
  series: seriesBindingSchema,
  anomaly: anomalyField(),
  /** Months by which the index leads the series. */
  lag: z.number().int().min(-FIGURE_MAX_LAG).max(FIGURE_MAX_LAG).default(0),
});

/** `data` of a scatter figure: pairs (index anomaly at t, series anomaly at t + lag) and the OLS line. */
export const scatterResultSchema = z.object({
  lag: z.number(),
  xUnits: z.string(),
  yUnits: z.string(),
  points: z.array(z.object({ month: z.string(), x: z.number(), y: z.number() })),
  fit: z.object({ slope: nullableNumber(), intercept: nullableNumber(), slopeStdErr: nullableNumber(), r2: nullableNumber(), n: z.number() }),
  line: z.array(z.object({ x: z.number(), y: z.number() })),
});
export type ScatterData = z.output<typeof scatterResultSchema>;

/** The scatter kind. */
export const scatterKind = defineFigureKind({
  kind: 'scatter',
  label: 'Index against carbon anomaly',
  recipe: scatterRecipeSchema,
  skeleton: { index: { seriesId: '', version: 'latest' }, series: { seriesId: '', version: 'latest' } },
  result: scatterResultSchema,
  spec: scatterSpec,
  table: (d) => ({ header: ['month', `x (${d.xUnits})`, `y (${d.yUnits})`], rows: d.points.map((p) => [p.month, p.x, p.y]) }),
});

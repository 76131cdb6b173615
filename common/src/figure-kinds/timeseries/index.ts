/** A series over time (raw or anomalies) with its trend and the warm/cold events of an index shaded behind it. */
import { z } from 'zod';
import { defineFigureKind } from '../kind';
import { anomalyField, eventSourceField, seriesBindingSchema } from '../shared/recipe-parts';
import { figureEventSchema, monthValueSchema, nullableNumber } from '../shared/result-parts';
import { timeseriesSpec } from './spec';

/** Recipe of a series-over-time figure. */
export const timeseriesRecipeSchema = z.strictObject({
  kind: z.literal('timeseries'),
  series: seriesBindingSchema,
  show: z.enum(['raw', 'anomaly']).default('anomaly'),
  anomaly: anomalyField(),
  /** Index whose events are shaded behind the series (the series itself when absent). */
  index: seriesBindingSchema.optional(),
  events: eventSourceField(),
});

/** `data` of a timeseries figure: the series (raw or anomaly), its trend, and the events to shade. */
export const timeseriesResultSchema = z.object({
  units: z.string(),
  show: z.enum(['raw', 'anomaly']),
  points: z.array(monthValueSchema),
  events: z.array(figureEventSchema),
  /**
   * perDecadeStdErr is the OLS one; perDecadeStdErrAdjusted, nEffResiduals and pAdjusted allow for AR(1) residuals
   * (Santer et al. 2000, J. Geophys. Res.); absent in results stored before issue 14.
   */
  trend: z.object({
    perDecade: nullableNumber(),
    perDecadeStdErr: nullableNumber(),
    r2: nullableNumber(),
    n: z.number(),
    perDecadeStdErrAdjusted: nullableNumber().optional(),
    nEffResiduals: nullableNumber().optional(),
    pAdjusted: nullableNumber().optional(),
  }),
});
export type TimeseriesData = z.output<typeof timeseriesResultSchema>;

/** The timeseries kind. */
export const timeseriesKind = defineFigureKind({
  kind: 'timeseries',
  label: 'Series over time',
  recipe: timeseriesRecipeSchema,
  skeleton: { series: { seriesId: '', version: 'latest' } },
  result: timeseriesResultSchema,
  spec: timeseriesSpec,
  table(d) {
    const phaseOf = (m: string) => d.events.find((e) => e.start <= m && m <= e.end)?.phase ?? '';
    return { header: ['month', `value (${d.units})`, 'event'], rows: d.points.map((p) => [p.month, p.value, phaseOf(p.month)]) };
  },
});

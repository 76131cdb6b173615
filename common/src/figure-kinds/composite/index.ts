/** The series anomaly around the peaks of one phase's events (superposed epoch), with its interval and every member. */
import { z } from 'zod';
import { defineFigureKind } from '../kind';
import { anomalyField, eventSourceField, phaseSchema, seriesBindingSchema } from '../shared/recipe-parts';
import { figureEventSchema, nullableNumber } from '../shared/result-parts';
import { compositeSpec } from './spec';

/** Recipe of a composite figure. */
export const compositeRecipeSchema = z.strictObject({
  kind: z.literal('composite'),
  index: seriesBindingSchema,
  series: seriesBindingSchema,
  anomaly: anomalyField(),
  events: eventSourceField(),
  phase: phaseSchema.default('warm'),
  /** Months before and after each event peak. */
  before: z.number().int().min(0).max(60).default(12),
  after: z.number().int().min(0).max(60).default(24),
  confidence: z.number().gt(0).lt(1).default(0.95),
});

/** `data` of a composite figure: mean and interval per offset, and each member for spaghetti lines. */
export const compositeResultSchema = z.object({
  phase: phaseSchema,
  units: z.string(),
  confidence: z.number(),
  events: z.array(figureEventSchema),
  offsets: z.array(z.object({ offset: z.number(), mean: nullableNumber(), lower: nullableNumber(), upper: nullableNumber(), n: z.number() })),
  /** One record per event (named by its peak month) and offset. */
  members: z.array(z.object({ event: z.string(), offset: z.number(), value: nullableNumber() })),
});
export type CompositeData = z.output<typeof compositeResultSchema>;

/** The composite kind. */
export const compositeKind = defineFigureKind({
  kind: 'composite',
  label: 'Event composite',
  recipe: compositeRecipeSchema,
  skeleton: { index: { seriesId: '', version: 'latest' }, series: { seriesId: '', version: 'latest' } },
  result: compositeResultSchema,
  spec: compositeSpec,
  table(d) {
    const events = [...new Set(d.members.map((m) => m.event))];
    const value = new Map(d.members.map((m) => [`${m.event}@${m.offset}`, m.value]));
    return {
      header: ['offset', `mean (${d.units})`, 'lower', 'upper', 'n', ...events.map((e) => `event peaking ${e}`)],
      rows: d.offsets.map((o) => [o.offset, o.mean, o.lower, o.upper, o.n, ...events.map((e) => value.get(`${e}@${o.offset}`) ?? null)]),
    };
  },
});

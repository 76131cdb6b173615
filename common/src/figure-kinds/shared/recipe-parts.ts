/**
 * Pieces shared by the recipe schemas of several figure kinds: series bindings, base periods,
 * anomaly options and the event source. Each default and bound is written here once; forms read
 * them back from the schemas (see form-schema.ts), the server parses with them.
 */
import { z } from 'zod';
import { yearMonthSchema as monthSchema } from '../../api/analysis';

/** Limits of figure recipes that more than one kind shares (a kind's own bounds live in its schema). */
export const FIGURE_LIMITS = {
  maxBoundSeries: 12,
  /** Longest caption of a live figure, checked where documents are stored and in the caption field. */
  captionMax: 2000,
  maxEventsInSet: 200,
  eventLabelMax: 80,
} as const;

/** A stored series a figure binds: its latest version, or one pinned version. */
export const seriesBindingSchema = z.strictObject({
  seriesId: z.uuid({ error: 'seriesId must be the id of a stored series' }),
  version: z.union([z.literal('latest'), z.number().int().min(1)]).default('latest'),
});
export type SeriesBinding = z.input<typeof seriesBindingSchema>;

/** Defaults a researcher expects: the current WMO standard normal (WMO-No. 1203). */
export const DEFAULT_BASE_PERIOD = { from: '1991-01', to: '2020-12' } as const;

/** A base period for anomalies, inclusive; the WMO standard normal 1991–2020 by default. */
export const basePeriodSchema = z
  .strictObject({ from: monthSchema, to: monthSchema })
  .refine((b) => b.from <= b.to, 'the base period must not end before it starts');

/** A running mean's width: an odd number of months (1 = none). */
const oddMonths = z.number().int().min(1).max(61).refine((n) => n % 2 === 1, 'smoothing must be an odd number of months');

/**
 * How anomalies are made from a bound series. The figures' anomalies are unsmoothed unless asked
 * (smooth 1); the event rule smooths the index by its own running mean (3, below).
 */
export const anomalyOptionsSchema = z.strictObject({
  base: basePeriodSchema.default(DEFAULT_BASE_PERIOD),
  method: z.enum(['monthly-mean', 'harmonic']).default('monthly-mean'),
  standardize: z.boolean().default(false),
  detrend: z.boolean().default(false),
  smooth: oddMonths.default(1),
});
export type AnomalyOptions = z.input<typeof anomalyOptionsSchema>;
/** Anomaly options after parsing (every default filled in). */
export type ParsedAnomalyOptions = z.output<typeof anomalyOptionsSchema>;

/**
 * The operational event rule (threshold on the index anomaly, minimum run length, smoothing,
 * optional rounding): NOAA CPC's ONI rule, 0.5 / 5 months / 3-month running mean. The figures'
 * rule smooths by 3 months although the engine's detectEvents defaults to 1 (none): the defaults
 * here are the figures' and the detect route's, written once.
 */
export const eventRuleSchema = z.strictObject({
  from: z.literal('rule'),
  threshold: z.number().positive().max(10).default(0.5),
  minDuration: z.number().int().min(1).max(60).default(5),
  smooth: oddMonths.default(3),
  roundTo: z.number().int().min(0).max(6).optional(),
});
export type EventRule = z.input<typeof eventRuleSchema>;
/** The event rule after parsing. */
export type ParsedEventRule = z.output<typeof eventRuleSchema>;

/** Which events a figure uses: detected from the index by the rule, or a notebook's saved event set. */
export const eventSourceSchema = z.discriminatedUnion('from', [eventRuleSchema, z.strictObject({ from: z.literal('event-set'), eventSetId: z.uuid() })]);
export type EventSource = z.input<typeof eventSourceSchema>;
/** An event source after parsing. */
export type ParsedEventSource = z.output<typeof eventSourceSchema>;

/** The rule with every default, as the schema fills it in (for prefaults and forms). */
export const DEFAULT_EVENT_SOURCE: ParsedEventRule = eventRuleSchema.parse({ from: 'rule' });

/** An event source field of a recipe: the rule with its defaults when absent. */
export const eventSourceField = () => eventSourceSchema.prefault({ from: 'rule' });
/** An anomaly-options field of a recipe: every default when absent. */
export const anomalyField = () => anomalyOptionsSchema.prefault({});

/** Warm or cold. */
export const phaseSchema = z.enum(['warm', 'cold']);
export type Phase = z.output<typeof phaseSchema>;

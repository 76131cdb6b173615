import { z } from 'zod';
import { plainText } from './text';
import { yearMonthSchema as monthSchema } from './analysis';

/** Limits shared by the figure form and the server. */
export const FIGURE_LIMITS = {
  maxLag: 60,
  maxCompositeOffset: 60,
  maxBoundSeries: 12,
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

/** A base period for anomalies, inclusive; the WMO standard normal 1991–2020 by default. */
export const basePeriodSchema = z
  .strictObject({ from: monthSchema, to: monthSchema })
  .refine((b) => b.from <= b.to, 'the base period must not end before it starts');

/** Defaults a researcher expects: the current WMO standard normal (WMO-No. 1203). */
export const DEFAULT_BASE_PERIOD = { from: '1991-01', to: '2020-12' } as const;

/** How anomalies are made from a bound series. */
export const anomalyOptionsSchema = z.strictObject({
  base: basePeriodSchema.default(DEFAULT_BASE_PERIOD),
  method: z.enum(['monthly-mean', 'harmonic']).default('monthly-mean'),
  standardize: z.boolean().default(false),
  detrend: z.boolean().default(false),
  smooth: z.number().int().min(1).max(61).refine((n) => n % 2 === 1, 'smoothing must be an odd number of months').default(1),
});
export type AnomalyOptions = z.input<typeof anomalyOptionsSchema>;

/**
 * Which events a figure uses: detected from the index by the operational rule
 * (threshold on the index anomaly, minimum run length, optional smoothing and
 * rounding), or a notebook's saved event set.
 */
export const eventSourceSchema = z.discriminatedUnion('from', [
  z.strictObject({
    from: z.literal('rule'),
    threshold: z.number().positive().max(10).default(0.5),
    minDuration: z.number().int().min(1).max(60).default(5),
    smooth: z.number().int().min(1).max(61).refine((n) => n % 2 === 1, 'smoothing must be an odd number of months').default(3),
    roundTo: z.number().int().min(0).max(6).optional(),
  }),
  z.strictObject({ from: z.literal('event-set'), eventSetId: z.uuid() }),
]);
export type EventSource = z.input<typeof eventSourceSchema>;
export const DEFAULT_EVENT_SOURCE = { from: 'rule', threshold: 0.5, minDuration: 5, smooth: 3 } as const;

const binding = seriesBindingSchema;
const phase = z.enum(['warm', 'cold']);

/** The analysis recipes a live figure can show; a recipe lives in the figure node's attributes. */
export const figureRecipeSchema = z.discriminatedUnion('kind', [
  z.strictObject({
    kind: z.literal('timeseries'),
    series: binding,
    show: z.enum(['raw', 'anomaly']).default('anomaly'),
    anomaly: anomalyOptionsSchema.prefault({}),
    /** Index whose events are shaded behind the series (the series itself when absent). */
    index: binding.optional(),
    events: eventSourceSchema.prefault(DEFAULT_EVENT_SOURCE),
  }),
  z.strictObject({
    kind: z.literal('seasonal-cycle'),
    series: binding,
    base: basePeriodSchema.default(DEFAULT_BASE_PERIOD),
  }),
  z.strictObject({
    kind: z.literal('lag-correlation'),
    index: binding,
    series: binding,
    anomaly: anomalyOptionsSchema.prefault({}),
    maxLag: z.number().int().min(0).max(FIGURE_LIMITS.maxLag).default(24),
    method: z.enum(['pearson', 'spearman']).default('pearson'),
    alpha: z.number().gt(0).lt(0.5).default(0.05),
  }),
  z.strictObject({
    kind: z.literal('composite'),
    index: binding,
    series: binding,
    anomaly: anomalyOptionsSchema.prefault({}),
    events: eventSourceSchema.prefault(DEFAULT_EVENT_SOURCE),
    phase: phase.default('warm'),
    before: z.number().int().min(0).max(FIGURE_LIMITS.maxCompositeOffset).default(12),
    after: z.number().int().min(0).max(FIGURE_LIMITS.maxCompositeOffset).default(24),
    confidence: z.number().gt(0).lt(1).default(0.95),
  }),
  z.strictObject({
    kind: z.literal('event-table'),
    index: binding,
    /** Carbon series whose change over each event is reported (rates are integrated; inventories differenced). */
    carbon: z.array(binding).max(FIGURE_LIMITS.maxBoundSeries).default([]),
    anomaly: anomalyOptionsSchema.prefault({}),
    events: eventSourceSchema.prefault(DEFAULT_EVENT_SOURCE),
  }),
  z.strictObject({
    kind: z.literal('budget'),
    tendency: binding,
    terms: z.array(z.strictObject({ name: plainText({ what: 'a term name' }).trim().min(1).max(60), series: binding })).min(1).max(FIGURE_LIMITS.maxBoundSeries),
  }),
  z.strictObject({
    kind: z.literal('hovmoller'),
    zonalFieldId: z.uuid(),
    show: z.enum(['raw', 'anomaly']).default('anomaly'),
    base: basePeriodSchema.default(DEFAULT_BASE_PERIOD),
  }),
  z.strictObject({
    kind: z.literal('scatter'),
    index: binding,
    series: binding,
    anomaly: anomalyOptionsSchema.prefault({}),
    /** Months by which the index leads the series. */
    lag: z.number().int().min(-FIGURE_LIMITS.maxLag).max(FIGURE_LIMITS.maxLag).default(0),
  }),
]);
export type FigureRecipe = z.input<typeof figureRecipeSchema>;
export type ParsedFigureRecipe = z.output<typeof figureRecipeSchema>;
export type FigureKind = ParsedFigureRecipe['kind'];

/** Words shown for each recipe. */
export const FIGURE_KIND_LABELS: Record<FigureKind, string> = {
  timeseries: 'Series over time',
  'seasonal-cycle': 'Seasonal cycle',
  'lag-correlation': 'Lagged correlation',
  composite: 'Event composite',
  'event-table': 'Event table',
  budget: 'Budget closure',
  hovmoller: 'Time–latitude diagram',
  scatter: 'Index against carbon anomaly',
};

/** Body of POST /api/notebooks/:notebookId/figures: compute one recipe over the notebook group's series. */
export const computeFigureRequestSchema = z.strictObject({ recipe: figureRecipeSchema });
export type ComputeFigureRequest = z.input<typeof computeFigureRequestSchema>;

/** One series version a figure was computed from. */
export const usedSeriesSchema = z.object({
  seriesId: z.string(),
  name: z.string(),
  version: z.number(),
  units: z.string(),
  origin: z.string(),
  valuesSha256: z.string(),
});
export type UsedSeries = z.infer<typeof usedSeriesSchema>;

/** A scalar a figure offers to the text as a live number. */
export const figureNumberSchema = z.object({
  key: z.string(),
  label: z.string(),
  value: z.number().nullable(),
  units: z.string(),
});
export type FigureNumber = z.infer<typeof figureNumberSchema>;

/**
 * Answer of the figure route: the recipe's computed data (its shape depends
 * on the kind), the numbers it offers to the text, the versions it used, a
 * methods sentence and cautions to show under the figure.
 */
export const figureResultSchema = z.object({
  kind: z.string(),
  data: z.record(z.string(), z.unknown()),
  numbers: z.array(figureNumberSchema),
  used: z.array(usedSeriesSchema),
  methods: z.string(),
  cautions: z.array(z.string()),
  warnings: z.array(z.string()),
  engineVersion: z.string(),
  cacheKey: z.string(),
  cached: z.boolean(),
});
export type FigureResult = z.infer<typeof figureResultSchema>;

/** One event in a saved event set. */
export const eventSetEntrySchema = z.strictObject({
  phase: phase,
  start: monthSchema,
  peak: monthSchema,
  end: monthSchema,
  label: plainText({ what: 'label' }).trim().max(FIGURE_LIMITS.eventLabelMax).default(''),
}).refine((e) => e.start <= e.peak && e.peak <= e.end, 'an event’s peak must lie between its start and end');

/** Body of POST/PUT event sets of a notebook. */
export const saveEventSetRequestSchema = z.strictObject({
  name: plainText({ what: 'name' }).trim().min(1).max(120),
  /** Where the events first came from (index and rule), kept as provenance. */
  derivedFrom: z.strictObject({ index: binding, rule: eventSourceSchema }).optional(),
  events: z.array(eventSetEntrySchema).max(FIGURE_LIMITS.maxEventsInSet),
});
export type SaveEventSetRequest = z.input<typeof saveEventSetRequestSchema>;

/** An event set as the API shows it. */
export const eventSetSchema = z.object({
  id: z.string(),
  notebookId: z.string(),
  name: z.string(),
  derivedFrom: z.unknown().nullable(),
  events: z.array(z.object({ phase, start: z.string(), peak: z.string(), end: z.string(), label: z.string() })),
  updatedAt: z.string(),
});
export type EventSetView = z.infer<typeof eventSetSchema>;

// ── Additions for the figure and event-set routes ────────────────────────────────────────

/**
 * Version of the engine's figure results. Part of every figure's cache key: bump it whenever a
 * change to the engine or to a recipe changes what a figure computes, so stored answers expire.
 */
export const ENGINE_VERSION = '1.0.0';

/** The operational rule on its own (the `rule` branch of eventSourceSchema), for detection requests. */
export const eventRuleSchema = eventSourceSchema.options[0];
export type EventRule = z.input<typeof eventRuleSchema>;

/**
 * Body of POST /api/notebooks/:notebookId/event-sets/detect: detect events in an index by the rule
 * without saving them, so the authors can edit them first. The index anomaly is made with
 * `anomaly` (base period, climatology, detrend, standardize); its `smooth` is replaced by the
 * rule's running mean, so the index is never smoothed twice.
 */
export const detectEventSetRequestSchema = z.strictObject({
  index: binding,
  rule: eventRuleSchema.prefault(DEFAULT_EVENT_SOURCE),
  anomaly: anomalyOptionsSchema.prefault({}),
});
export type DetectEventSetRequest = z.input<typeof detectEventSetRequestSchema>;

/** One event as a figure or a detection shows it; peakValue and strength are null where the index has no value at the peak. */
export interface FigureEvent {
  phase: 'warm' | 'cold';
  start: string;
  peak: string;
  end: string;
  months: number;
  peakValue: number | null;
  strength: 'weak' | 'moderate' | 'strong' | 'very strong' | null;
  label: string;
}

/** Answer of the detect route: the events, ready to edit and save as an event set. */
export interface DetectedEvents {
  index: UsedSeries;
  events: FigureEvent[];
  methods: string;
  warnings: string[];
}

/** A month's value, the record vega-lite plots on a temporal x axis. */
export interface MonthValue {
  month: string;
  value: number | null;
}

/** `data` of a timeseries figure: the series (raw or anomaly), its trend, and the events to shade. */
export interface TimeseriesData {
  units: string;
  show: 'raw' | 'anomaly';
  points: MonthValue[];
  events: FigureEvent[];
  trend: { perDecade: number | null; perDecadeStdErr: number | null; r2: number | null; n: number };
}

/** `data` of a seasonal-cycle figure: per calendar month (1 = January) over the base period. */
export interface SeasonalCycleData {
  units: string;
  base: { from: string; to: string };
  months: { month: number; name: string; mean: number | null; sd: number | null; min: number | null; max: number | null; n: number; years: number }[];
}

/** One lag of a lag-correlation figure, with the |r| needed for significance at alpha. */
export interface LagRow {
  lag: number;
  r: number | null;
  n: number;
  nEff: number | null;
  p: number | null;
  threshold: number | null;
}

/** `data` of a lag-correlation figure (positive lag: the index leads the series). */
export interface LagCorrelationData {
  method: 'pearson' | 'spearman';
  alpha: number;
  lags: LagRow[];
  strongest: LagRow | null;
}

/** `data` of a composite figure: mean and interval per offset, and each member for spaghetti lines. */
export interface CompositeData {
  phase: 'warm' | 'cold';
  units: string;
  confidence: number;
  events: FigureEvent[];
  offsets: { offset: number; mean: number | null; lower: number | null; upper: number | null; n: number }[];
  members: { event: string; offset: number; value: number | null }[];
}

/** How a carbon series' change over an event was found. */
export type CarbonTreatment = 'rate-integrated' | 'inventory-difference' | null;

/** `data` of an event table: one row per event; `carbon[seriesId]` is the change in Pg C (null when it cannot be computed). */
export interface EventTableData {
  carbonSeries: { seriesId: string; name: string; units: string; treatment: CarbonTreatment }[];
  rows: (FigureEvent & { carbon: Record<string, number | null> })[];
}

/** `data` of a budget figure: month records for lines, and one record per term and month for stacking. */
export interface BudgetData {
  units: string;
  termNames: string[];
  months: { month: string; tendency: number | null; sumOfTerms: number | null; residual: number | null }[];
  terms: { month: string; term: string; value: number | null }[];
  rmsResidual: number | null;
  relativeResidual: number | null;
}

/** `data` of a time–latitude diagram: one record per month and latitude. */
export interface HovmollerData {
  units: string;
  show: 'raw' | 'anomaly';
  latitudes: number[];
  cells: { month: string; lat: number; value: number | null }[];
}

/** `data` of a scatter figure: pairs (index anomaly at t, series anomaly at t + lag) and the OLS line. */
export interface ScatterData {
  lag: number;
  xUnits: string;
  yUnits: string;
  points: { month: string; x: number; y: number }[];
  fit: { slope: number | null; intercept: number | null; slopeStdErr: number | null; r2: number | null; n: number };
  line: { x: number; y: number }[];
}

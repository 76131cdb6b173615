/**
 * Request and response schemas of the analysis routes, POST /api/analysis/<name>, with their types
 * inferred from the schemas, the shared limits, and for each route a run function that takes the
 * parsed body and returns the response. Run functions are the pure engine functions; besides what
 * the schemas reject they throw AnalysisInputError (e.g. a period with missing months) or UnitError
 * (unreadable or incompatible units), which the server should answer with 422 and the message.
 */
import { z } from 'zod';
import { plainText } from './text';
import { composite } from '../events/composite';
import { detectEvents } from '../events/detect-events';
import { anomaly } from '../series/anomaly';
import { budget } from '../series/budget';
import { MAX_HARMONICS } from '../series/climatology-harmonic';
import { integrate } from '../series/integrate';
import { trend } from '../series/trend';
import { lagCorrelation } from '../stats/lag-correlation';

/** Longest series accepted, in months (2,000 years). */
export const MAX_SERIES_MONTHS = 24_000;
/** Largest |lag| of a lag-correlation scan, in months (10 years). */
export const MAX_LAG_MONTHS = 120;
/** Widest running mean (odd), in months. */
export const MAX_SMOOTH_MONTHS = 61;
/** Most months before or after an event in a composite. */
export const MAX_COMPOSITE_OFFSET = 120;
/** Most events in a composite. */
export const MAX_COMPOSITE_EVENTS = 500;
/** Most terms in a budget. */
export const MAX_BUDGET_TERMS = 32;
/** Most decimals for the events' roundTo. */
export const MAX_ROUND_DECIMALS = 6;
/** Most harmonics of the harmonic climatology (re-stated for forms; the engine's MAX_HARMONICS). */
export const MAX_ANOMALY_HARMONICS = MAX_HARMONICS;

/** A calendar month "YYYY-MM". */
export const yearMonthSchema = z.string().regex(/^\d{4}-(0[1-9]|1[0-2])$/, 'a month must be written YYYY-MM');

/** A monthly series: consecutive months from start; null = missing (JSON has no NaN). */
export const monthlySeriesSchema = z.object({
  start: yearMonthSchema,
  values: z.array(z.number().nullable()).max(MAX_SERIES_MONTHS),
});

const oddWidth = z
  .number()
  .int()
  .min(1)
  .max(MAX_SMOOTH_MONTHS)
  .refine((n) => n % 2 === 1, 'smooth must be an odd number of months');
const nullableNumber = z.number().nullable();

// ── anomaly ──────────────────────────────────────────────────────────────────────────────
/** Body of POST /api/analysis/anomaly. */
export const anomalyRequestSchema = z.object({
  series: monthlySeriesSchema,
  base: z
    .object({ from: yearMonthSchema, to: yearMonthSchema })
    .refine((b) => b.from <= b.to, 'base.from must not be after base.to'),
  method: z.enum(['monthly-mean', 'harmonic']).optional(),
  harmonics: z.number().int().min(0).max(MAX_HARMONICS).optional(),
  standardize: z.boolean().optional(),
  detrend: z.boolean().optional(),
  smooth: oddWidth.optional(),
  minYears: z.number().int().min(1).max(2000).optional(),
});
/** Response of POST /api/analysis/anomaly. */
export const anomalyResponseSchema = z.object({
  anomaly: monthlySeriesSchema,
  climatology: z.array(nullableNumber).length(12),
  warnings: z.array(z.string()),
});
/** Type of a parsed body, inferred from anomalyRequestSchema. */
export type AnomalyRequest = z.infer<typeof anomalyRequestSchema>;
/** Type of a parsed result, inferred from anomalyResponseSchema. */
export type AnomalyResponse = z.infer<typeof anomalyResponseSchema>;
/** Runs the anomaly route on a parsed body. */
export function runAnomaly(body: AnomalyRequest): AnomalyResponse {
  return anomaly(body);
}

// ── lag-correlation ──────────────────────────────────────────────────────────────────────
/** Body of POST /api/analysis/lag-correlation. */
export const lagCorrelationRequestSchema = z.object({
  x: monthlySeriesSchema,
  y: monthlySeriesSchema,
  maxLag: z.number().int().min(0).max(MAX_LAG_MONTHS),
  method: z.enum(['pearson', 'spearman']).optional(),
});
/** Response of POST /api/analysis/lag-correlation. */
export const lagCorrelationResponseSchema = z.object({
  lags: z.array(z.object({ lag: z.number().int(), r: nullableNumber, n: z.number().int(), nEff: nullableNumber, p: nullableNumber })),
});
/** Type of a parsed body, inferred from lagCorrelationRequestSchema. */
export type LagCorrelationRequest = z.infer<typeof lagCorrelationRequestSchema>;
/** Type of a parsed result, inferred from lagCorrelationResponseSchema. */
export type LagCorrelationResponse = z.infer<typeof lagCorrelationResponseSchema>;
/** Runs the lag-correlation route on a parsed body. */
export function runLagCorrelation(body: LagCorrelationRequest): LagCorrelationResponse {
  return lagCorrelation(body);
}

// ── events ───────────────────────────────────────────────────────────────────────────────
/** Body of POST /api/analysis/events. */
export const eventsRequestSchema = z.object({
  index: monthlySeriesSchema,
  threshold: z.number().positive().optional(),
  minDuration: z.number().int().min(1).max(MAX_SERIES_MONTHS).optional(),
  smooth: oddWidth.optional(),
  roundTo: z.number().int().min(0).max(MAX_ROUND_DECIMALS).optional(),
});
/** Response of POST /api/analysis/events. */
export const eventsResponseSchema = z.object({
  events: z.array(
    z.object({
      phase: z.enum(['warm', 'cold']),
      start: yearMonthSchema,
      end: yearMonthSchema,
      peak: yearMonthSchema,
      peakValue: z.number(),
      months: z.number().int(),
      strength: z.enum(['weak', 'moderate', 'strong', 'very strong']),
    }),
  ),
});
/** Type of a parsed body, inferred from eventsRequestSchema. */
export type EventsRequest = z.infer<typeof eventsRequestSchema>;
/** Type of a parsed result, inferred from eventsResponseSchema. */
export type EventsResponse = z.infer<typeof eventsResponseSchema>;
/** Runs the events route on a parsed body. */
export function runEvents(body: EventsRequest): EventsResponse {
  return detectEvents(body);
}

// ── composite ────────────────────────────────────────────────────────────────────────────
/** Body of POST /api/analysis/composite; event months must be strictly increasing. */
export const compositeRequestSchema = z.object({
  series: monthlySeriesSchema,
  events: z
    .array(z.object({ at: yearMonthSchema }))
    .max(MAX_COMPOSITE_EVENTS)
    .superRefine((events, ctx) => {
      for (let i = 1; i < events.length; i++) {
        if (events[i].at <= events[i - 1].at) {
          ctx.addIssue({
            code: 'custom',
            path: [i, 'at'],
            message: `event dates must be strictly increasing: ${events[i].at} follows ${events[i - 1].at}${events[i].at === events[i - 1].at ? ' (duplicate)' : ''}`,
          });
        }
      }
    }),
  before: z.number().int().min(0).max(MAX_COMPOSITE_OFFSET),
  after: z.number().int().min(0).max(MAX_COMPOSITE_OFFSET),
  confidence: z.number().gt(0).lt(1).optional(),
});
/** Response of POST /api/analysis/composite. */
export const compositeResponseSchema = z.object({
  offsets: z.array(z.number().int()),
  mean: z.array(nullableNumber),
  lower: z.array(nullableNumber),
  upper: z.array(nullableNumber),
  n: z.array(z.number().int()),
  members: z.array(z.array(nullableNumber)),
});
/** Type of a parsed body, inferred from compositeRequestSchema. */
export type CompositeRequest = z.infer<typeof compositeRequestSchema>;
/** Type of a parsed result, inferred from compositeResponseSchema. */
export type CompositeResponse = z.infer<typeof compositeResponseSchema>;
/** Runs the composite route on a parsed body. */
export function runComposite(body: CompositeRequest): CompositeResponse {
  return composite(body);
}

// ── trend ────────────────────────────────────────────────────────────────────────────────
/** Body of POST /api/analysis/trend. */
export const trendRequestSchema = z.object({ series: monthlySeriesSchema, per: z.enum(['year', 'decade']).optional() });
/** Response of POST /api/analysis/trend. */
export const trendResponseSchema = z.object({
  slope: nullableNumber,
  intercept: nullableNumber,
  slopeStdErr: nullableNumber,
  r2: nullableNumber,
  n: z.number().int(),
});
/** Type of a parsed body, inferred from trendRequestSchema. */
export type TrendRequest = z.infer<typeof trendRequestSchema>;
/** Type of a parsed result, inferred from trendResponseSchema. */
export type TrendResponse = z.infer<typeof trendResponseSchema>;
/** Runs the trend route on a parsed body. */
export function runTrend(body: TrendRequest): TrendResponse {
  return trend(body);
}

// ── budget ───────────────────────────────────────────────────────────────────────────────
/** Body of POST /api/analysis/budget: at least one named term. */
export const budgetRequestSchema = z.object({
  tendency: monthlySeriesSchema,
  terms: z
    .record(plainText({ what: 'a term name' }).min(1).max(64), monthlySeriesSchema)
    .refine((t) => Object.keys(t).length >= 1, 'a budget needs at least one term')
    .refine((t) => Object.keys(t).length <= MAX_BUDGET_TERMS, `a budget has at most ${MAX_BUDGET_TERMS} terms`),
});
/** Response of POST /api/analysis/budget. */
export const budgetResponseSchema = z.object({
  sumOfTerms: monthlySeriesSchema,
  residual: monthlySeriesSchema,
  rmsResidual: nullableNumber,
  relativeResidual: nullableNumber,
});
/** Type of a parsed body, inferred from budgetRequestSchema. */
export type BudgetRequest = z.infer<typeof budgetRequestSchema>;
/** Type of a parsed result, inferred from budgetResponseSchema. */
export type BudgetResponse = z.infer<typeof budgetResponseSchema>;
/** Runs the budget route on a parsed body. */
export function runBudget(body: BudgetRequest): BudgetResponse {
  return budget(body);
}

// ── integrate ────────────────────────────────────────────────────────────────────────────
/** Body of POST /api/analysis/integrate. */
export const integrateRequestSchema = z
  .object({ series: monthlySeriesSchema, units: plainText({ what: 'units' }).min(1).max(64), from: yearMonthSchema, to: yearMonthSchema })
  .refine((b) => b.from <= b.to, { message: 'from must not be after to', path: ['to'] });
/** Response of POST /api/analysis/integrate. */
export const integrateResponseSchema = z.object({ total: z.number(), units: z.string() });
/** Type of a parsed body, inferred from integrateRequestSchema. */
export type IntegrateRequest = z.infer<typeof integrateRequestSchema>;
/** Type of a parsed result, inferred from integrateResponseSchema. */
export type IntegrateResponse = z.infer<typeof integrateResponseSchema>;
/** Runs the integrate route on a parsed body. */
export function runIntegrate(body: IntegrateRequest): IntegrateResponse {
  return integrate(body);
}

/**
 * The seven routes by their URL name, for a controller that registers them in one loop:
 * POST /api/analysis/<name> validates with `request`, calls `run`, and may check with `response`.
 */
export const ANALYSIS_ROUTES = {
  anomaly: { request: anomalyRequestSchema, response: anomalyResponseSchema, run: runAnomaly },
  'lag-correlation': { request: lagCorrelationRequestSchema, response: lagCorrelationResponseSchema, run: runLagCorrelation },
  events: { request: eventsRequestSchema, response: eventsResponseSchema, run: runEvents },
  composite: { request: compositeRequestSchema, response: compositeResponseSchema, run: runComposite },
  trend: { request: trendRequestSchema, response: trendResponseSchema, run: runTrend },
  budget: { request: budgetRequestSchema, response: budgetResponseSchema, run: runBudget },
  integrate: { request: integrateRequestSchema, response: integrateResponseSchema, run: runIntegrate },
} as const;

/** A route name of ANALYSIS_ROUTES. */
export type AnalysisRouteName = keyof typeof ANALYSIS_ROUTES;

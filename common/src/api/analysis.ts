/**
 * Request and response schemas of the analysis routes, POST /api/analysis/<name>, with their types
 * inferred from the schemas and the shared limits. The server's analysis module (server/src/analysis/
 * analysis-routes.ts) pairs each with the engine function that answers it.
 */
import { z } from 'zod';
import { plainText } from './text';
import { MAX_HARMONICS } from '../series/climatology-harmonic';
import { CF_CALENDAR_NAMES } from '../time/normalize-calendar';

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
/** Most phase-randomised surrogates of one lag-correlation request. */
export const MAX_SURROGATES = 10_000;
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

// ── lag-correlation ──────────────────────────────────────────────────────────────────────
/** Body of POST /api/analysis/lag-correlation. */
export const lagCorrelationRequestSchema = z.object({
  x: monthlySeriesSchema,
  y: monthlySeriesSchema,
  maxLag: z.number().int().min(0).max(MAX_LAG_MONTHS),
  method: z.enum(['pearson', 'spearman']).optional(),
  /** Per-lag test: "ar1" (t test with nEff, the default) or "phase-randomised" (Ebisuzaki 1997 surrogates). */
  significance: z.enum(['ar1', 'phase-randomised']).optional(),
  /** Number of phase-randomised surrogates for pSearch (and per-lag p); default 1000, 0 skips them. */
  surrogates: z.number().int().min(0).max(MAX_SURROGATES).optional(),
  /** Seed of the surrogates' PRNG (default 1997), so an answer repeats. */
  seed: z.number().int().min(0).max(0xffffffff).optional(),
});
const lagRowSchema = z.object({ lag: z.number().int(), r: nullableNumber, n: z.number().int(), nEff: nullableNumber, p: nullableNumber });
/** Response of POST /api/analysis/lag-correlation. */
export const lagCorrelationResponseSchema = z.object({
  lags: z.array(lagRowSchema),
  /** Largest |r| among lags with ≥ 2/3 of the overlap's pairs; p pointwise, pSearch corrected for the search over lags. */
  strongest: lagRowSchema.extend({ pSearch: nullableNumber }).nullable(),
});
/** Type of a parsed body, inferred from lagCorrelationRequestSchema. */
export type LagCorrelationRequest = z.infer<typeof lagCorrelationRequestSchema>;
/** Type of a parsed result, inferred from lagCorrelationResponseSchema. */
export type LagCorrelationResponse = z.infer<typeof lagCorrelationResponseSchema>;

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
  /** OLS SE × √((n − 2)/(nEffResiduals − 2)) (Santer et al. 2000). */
  slopeStdErrAdjusted: nullableNumber,
  /** n(1 − r1)/(1 + r1) with r1 the lag-1 autocorrelation of the residuals (NIST definition). */
  nEffResiduals: nullableNumber,
  /** Two-sided p of the slope with the adjusted SE and nEffResiduals − 2 degrees of freedom. */
  pAdjusted: nullableNumber,
});
/** Type of a parsed body, inferred from trendRequestSchema. */
export type TrendRequest = z.infer<typeof trendRequestSchema>;
/** Type of a parsed result, inferred from trendResponseSchema. */
export type TrendResponse = z.infer<typeof trendResponseSchema>;

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

// ── integrate ────────────────────────────────────────────────────────────────────────────
/** Body of POST /api/analysis/integrate. */
export const integrateRequestSchema = z
  .object({
    series: monthlySeriesSchema,
    units: plainText({ what: 'units' }).min(1).max(64),
    from: yearMonthSchema,
    to: yearMonthSchema,
    /** CF calendar of the series (CF 1.11 §4.4.1; aliases accepted); default standard. */
    calendar: z.enum(CF_CALENDAR_NAMES).optional(),
  })
  .refine((b) => b.from <= b.to, { message: 'from must not be after to', path: ['to'] });
/** Response of POST /api/analysis/integrate. */
export const integrateResponseSchema = z.object({ total: z.number(), units: z.string() });
/** Type of a parsed body, inferred from integrateRequestSchema. */
export type IntegrateRequest = z.infer<typeof integrateRequestSchema>;
/** Type of a parsed result, inferred from integrateResponseSchema. */
export type IntegrateResponse = z.infer<typeof integrateResponseSchema>;

/** The seven routes by their URL name, with the schemas that validate their bodies and answers. */
export const ANALYSIS_SCHEMAS = {
  anomaly: { request: anomalyRequestSchema, response: anomalyResponseSchema },
  'lag-correlation': { request: lagCorrelationRequestSchema, response: lagCorrelationResponseSchema },
  events: { request: eventsRequestSchema, response: eventsResponseSchema },
  composite: { request: compositeRequestSchema, response: compositeResponseSchema },
  trend: { request: trendRequestSchema, response: trendResponseSchema },
  budget: { request: budgetRequestSchema, response: budgetResponseSchema },
  integrate: { request: integrateRequestSchema, response: integrateResponseSchema },
} as const;

/** A route name of ANALYSIS_SCHEMAS. */
export type AnalysisRouteName = keyof typeof ANALYSIS_SCHEMAS;

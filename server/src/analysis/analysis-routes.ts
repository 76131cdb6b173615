import {
  ANALYSIS_SCHEMAS,
  DEFAULT_SURROGATES,
  anomaly,
  budget,
  composite,
  detectEvents,
  integrate,
  lagCorrelation,
  trend,
  type AnalysisRouteName,
  type AnomalyRequest,
  type AnomalyResponse,
  type BudgetRequest,
  type BudgetResponse,
  type CompositeRequest,
  type CompositeResponse,
  type EventsRequest,
  type EventsResponse,
  type IntegrateRequest,
  type IntegrateResponse,
  type LagCorrelationRequest,
  type LagCorrelationResponse,
  type TrendRequest,
  type TrendResponse,
} from '@upwell/common';
import type { ZodType } from 'zod';

/** Runs the anomaly route on a parsed body. */
export function runAnomaly(body: AnomalyRequest): AnomalyResponse {
  return anomaly(body);
}
/** Runs the lag-correlation route on a parsed body. */
export function runLagCorrelation(body: LagCorrelationRequest): LagCorrelationResponse {
  // The route's contract: 1000 surrogates unless the request says otherwise (the engine draws none by default).
  return lagCorrelation({ ...body, surrogates: body.surrogates ?? DEFAULT_SURROGATES });
}
/** Runs the events route on a parsed body. */
export function runEvents(body: EventsRequest): EventsResponse {
  return detectEvents(body);
}
/** Runs the composite route on a parsed body. */
export function runComposite(body: CompositeRequest): CompositeResponse {
  return composite(body);
}
/** Runs the trend route on a parsed body. */
export function runTrend(body: TrendRequest): TrendResponse {
  return trend(body);
}
/** Runs the budget route on a parsed body. */
export function runBudget(body: BudgetRequest): BudgetResponse {
  return budget(body);
}
/** Runs the integrate route on a parsed body. */
export function runIntegrate(body: IntegrateRequest): IntegrateResponse {
  return integrate(body);
}

/** One analysis route: its schemas, its engine call, and its OpenAPI summary. */
export interface AnalysisRoute {
  request: ZodType;
  response: ZodType;
  run: (body: never) => unknown;
  summary: string;
  description?: string;
}

/**
 * The seven routes POST /api/analysis/<name>, from which AnalysisController registers its handlers:
 * each validates with `request`, calls `run` (a pure engine function that may throw
 * AnalysisInputError, UnitError or CfTimeError for input the schema could not judge), and answers
 * what `response` describes.
 */
export const ANALYSIS_ROUTES = {
  anomaly: {
    ...ANALYSIS_SCHEMAS.anomaly,
    run: runAnomaly,
    summary: 'Deseasonalised anomalies against a base period (monthly-mean or harmonic climatology)',
    description:
      'Answers { anomaly, climatology (12, January first), warnings }. With detrend: true the trend and the 12 monthly means are fitted jointly (one least-squares fit, Thoning et al. 1989).',
  },
  'lag-correlation': {
    ...ANALYSIS_SCHEMAS['lag-correlation'],
    run: runLagCorrelation,
    summary: 'Lagged correlation of x and y for lags −maxLag..+maxLag (positive: x leads y)',
    description:
      'Answers { lags: [{ lag, r, n, nEff, p }], strongest: { lag, r, n, nEff, p, pSearch } }. nEff = n(1 − r1x·r1y)/(1 + r1x·r1y) after Bretherton et al. (1999); ' +
      'per-lag p is pointwise: two-sided with nEff − 2 degrees of freedom ("ar1"), or the share of phase-randomised surrogates (Ebisuzaki 1997) reaching |r| ("phase-randomised"). ' +
      'The strongest lag is chosen among lags with at least two thirds of the pairs; pSearch is the share of surrogates whose max |r| over those lags reaches the observed max, ' +
      'so it accounts for the search over lags. Correlation is not cause.',
  },
  events: {
    ...ANALYSIS_SCHEMAS.events,
    run: runEvents,
    summary: 'Warm and cold events: runs of ≥ minDuration months beyond ±threshold (the operational 3-month-index rule)',
  },
  composite: {
    ...ANALYSIS_SCHEMAS.composite,
    run: runComposite,
    summary: 'Event composite: mean and t-interval of the series at offsets around each event',
  },
  trend: {
    ...ANALYSIS_SCHEMAS.trend,
    run: runTrend,
    summary: 'Ordinary-least-squares trend per year or per decade, with its standard error',
    description:
      'slopeStdErr assumes independent months; slopeStdErrAdjusted, nEffResiduals and pAdjusted allow for the lag-1 autocorrelation of the residuals (Santer et al. 2000).',
  },
  budget: {
    ...ANALYSIS_SCHEMAS.budget,
    run: runBudget,
    summary: 'Budget closure: tendency minus the sum of the terms, month by month',
  },
  integrate: {
    ...ANALYSIS_SCHEMAS.integrate,
    run: runIntegrate,
    summary: 'Total change over a period of a rate series, honouring its unit and each month’s length in its calendar',
  },
} as const satisfies Record<AnalysisRouteName, AnalysisRoute>;

import { describe, expect, it } from 'vitest';
import { nino12Series } from '../../test-fixtures/read-fixture';
import { AnalysisInputError } from '../series/analysis-input-error';
import { composite } from '../events/composite';
import {
  ANALYSIS_SCHEMAS,
  MAX_LAG_MONTHS,
  anomalyRequestSchema,
  budgetRequestSchema,
  compositeRequestSchema,
  eventsRequestSchema,
  integrateRequestSchema,
  lagCorrelationRequestSchema,
  monthlySeriesSchema,
  trendRequestSchema,
} from './analysis';

const nino = nino12Series();
const bodies: Record<keyof typeof ANALYSIS_SCHEMAS, unknown> = {
  anomaly: { series: nino, base: { from: '1971-01', to: '2000-12' }, smooth: 3, standardize: true },
  'lag-correlation': { x: nino, y: { start: '1951-01', values: nino.values.slice(0, 400) }, maxLag: 24 },
  events: { index: { start: '2000-01', values: [0.6, 0.7, 0.8, 0.9, 0.7, 0.2] } },
  composite: { series: nino, events: [{ at: '1982-12' }, { at: '1997-12' }], before: 12, after: 12 },
  trend: { series: nino, per: 'decade' },
  budget: { tendency: { start: '2000-01', values: [1, 2, null] }, terms: { flux: { start: '2000-01', values: [1, 1, 1] } } },
  integrate: { series: { start: '2001-01', values: [2, 2, 2] }, units: 'PgC/yr', from: '2001-01', to: '2001-03' },
};

describe('analysis schemas', () => {
  it('has the seven routes anomaly, lag-correlation, events, composite, trend, budget, integrate', () => {
    expect(Object.keys(ANALYSIS_SCHEMAS).sort()).toEqual(['anomaly', 'budget', 'composite', 'events', 'integrate', 'lag-correlation', 'trend']);
  });

  for (const name of Object.keys(ANALYSIS_SCHEMAS) as (keyof typeof ANALYSIS_SCHEMAS)[]) {
    it(`${name}: a valid body parses`, () => {
      expect(ANALYSIS_SCHEMAS[name].request.safeParse(bodies[name]).success).toBe(true);
    });
  }
});

describe('request schemas reject bad input with a message', () => {
  it('a month not written YYYY-MM, or a value that is not a number or null', () => {
    expect(monthlySeriesSchema.safeParse({ start: '1997-13', values: [] }).success).toBe(false);
    expect(monthlySeriesSchema.safeParse({ start: '1997-01', values: ['1'] }).success).toBe(false);
    expect(monthlySeriesSchema.safeParse({ start: '1997-01', values: [1, null] }).success).toBe(true);
  });

  it('anomaly: a base period that ends before it starts, an even smooth, too many harmonics', () => {
    const series = { start: '2000-01', values: [1] };
    expect(anomalyRequestSchema.safeParse({ series, base: { from: '2001-01', to: '2000-01' } }).success).toBe(false);
    expect(anomalyRequestSchema.safeParse({ series, base: { from: '2000-01', to: '2000-12' }, smooth: 4 }).success).toBe(false);
    expect(anomalyRequestSchema.safeParse({ series, base: { from: '2000-01', to: '2000-12' }, harmonics: 6 }).success).toBe(false);
  });

  it(`lag-correlation: maxLag above MAX_LAG_MONTHS (${MAX_LAG_MONTHS}) or negative`, () => {
    const s = { start: '2000-01', values: [1, 2, 3] };
    expect(lagCorrelationRequestSchema.safeParse({ x: s, y: s, maxLag: MAX_LAG_MONTHS + 1 }).success).toBe(false);
    expect(lagCorrelationRequestSchema.safeParse({ x: s, y: s, maxLag: -1 }).success).toBe(false);
  });

  it('composite: unsorted or duplicate event dates, with a message naming them', () => {
    const series = { start: '2000-01', values: [1, 2, 3] };
    const unsorted = compositeRequestSchema.safeParse({ series, events: [{ at: '2000-03' }, { at: '2000-01' }], before: 0, after: 0 });
    expect(unsorted.success).toBe(false);
    expect(unsorted.error?.issues[0].message).toMatch(/strictly increasing: 2000-01 follows 2000-03/);
    const dup = compositeRequestSchema.safeParse({ series, events: [{ at: '2000-02' }, { at: '2000-02' }], before: 0, after: 0 });
    expect(dup.error?.issues[0].message).toMatch(/duplicate/);
  });

  it('composite: the engine function itself also refuses unsorted dates (AnalysisInputError)', () => {
    const series = { start: '2000-01', values: [1, 2, 3] };
    expect(() => composite({ series, events: [{ at: '2000-03' }, { at: '2000-01' }], before: 0, after: 0 })).toThrow(AnalysisInputError);
  });

  it('events, trend, budget, integrate: a non-positive threshold, an unknown per, no terms, a reversed period', () => {
    const s = { start: '2000-01', values: [1] };
    expect(eventsRequestSchema.safeParse({ index: s, threshold: 0 }).success).toBe(false);
    expect(trendRequestSchema.safeParse({ series: s, per: 'century' }).success).toBe(false);
    expect(budgetRequestSchema.safeParse({ tendency: s, terms: {} }).success).toBe(false);
    expect(integrateRequestSchema.safeParse({ series: s, units: 'PgC/yr', from: '2000-02', to: '2000-01' }).success).toBe(false);
    expect(integrateRequestSchema.safeParse({ series: s, units: 'PgC/yr', from: '2000-01', to: '2000-01', calendar: 'mayan' }).success).toBe(false);
    expect(integrateRequestSchema.safeParse({ series: s, units: 'PgC/yr', from: '2000-01', to: '2000-01', calendar: '365_day' }).success).toBe(true);
  });

  it('lag-correlation: an unknown significance test, negative or too many surrogates, a fractional seed', () => {
    const s = { start: '2000-01', values: [1, 2, 3] };
    expect(lagCorrelationRequestSchema.safeParse({ x: s, y: s, maxLag: 1, significance: 'bootstrap' }).success).toBe(false);
    expect(lagCorrelationRequestSchema.safeParse({ x: s, y: s, maxLag: 1, surrogates: -1 }).success).toBe(false);
    expect(lagCorrelationRequestSchema.safeParse({ x: s, y: s, maxLag: 1, surrogates: 10_001 }).success).toBe(false);
    expect(lagCorrelationRequestSchema.safeParse({ x: s, y: s, maxLag: 1, seed: 1.5 }).success).toBe(false);
    expect(lagCorrelationRequestSchema.safeParse({ x: s, y: s, maxLag: 1, significance: 'phase-randomised', surrogates: 0, seed: 3 }).success).toBe(true);
  });
});

import { describe, expect, it } from 'vitest';
import { BUDGET_RESIDUAL_MAX, BUDGET_TERMS, budgetTerms, DEMO_BUDGET, roundBudget } from './carbon-budget';
import { createRandomStream } from './random-stream';

const months = 240;
const quiet = new Float64Array(months);
const budgetFor = (sst: Float64Array, seed = 3) => budgetTerms(createRandomStream(seed), sst, quiet, 1980);

describe('budgetTerms()', () => {
  it('closes: |tendency − Σ terms| ≤ BUDGET_RESIDUAL_MAX every month, and the residual is not zero everywhere', () => {
    const b = budgetFor(quiet);
    const residuals = Array.from(b.tendency, (t, i) => t - BUDGET_TERMS.reduce((s, term) => s + b[term][i], 0));
    expect(Math.max(...residuals.map(Math.abs))).toBeLessThanOrEqual(BUDGET_RESIDUAL_MAX + 1e-9);
    expect(residuals.filter((r) => Math.abs(r) > 1e-9).length).toBeGreaterThan(months / 2);
  });

  it('keeps every value on the 4-decimal grid the CSV writes', () => {
    const b = budgetFor(quiet);
    for (const term of [...BUDGET_TERMS, 'tendency'] as const) for (const v of b[term]) expect(v).toBe(roundBudget(v));
  });

  it('responds to a warm anomaly with the stated signs and lags: less vertical supply a month later, less outgassing two months later', () => {
    const warm = new Float64Array(months);
    warm[100] = 2;
    const base = budgetFor(quiet);
    const hot = budgetFor(warm);
    const diff = (term: (typeof BUDGET_TERMS)[number], i: number) => hot[term][i] - base[term][i];
    expect(diff('verticalAdvection', 101)).toBeCloseTo(2 * DEMO_BUDGET.verticalAdvection.perDegree, 3);
    expect(diff('verticalAdvection', 100)).toBeCloseTo(0, 3);
    expect(diff('airSeaFlux', 102)).toBeCloseTo(2 * DEMO_BUDGET.airSeaFlux.perDegree, 3);
    expect(diff('biology', 102)).toBeGreaterThan(0); // weaker uptake
    expect(DEMO_BUDGET.verticalAdvection.perDegree).toBeLessThan(0);
    expect(DEMO_BUDGET.airSeaFlux.mean).toBeLessThan(0); // the sector outgasses (flux positive into the ocean)
  });

  it('has a seasonal cycle and a slow uptake trend in the air–sea flux', () => {
    const b = budgetFor(quiet);
    const monthMean = (m: number) => {
      let s = 0;
      for (let i = m; i < months; i += 12) s += b.verticalAdvection[i];
      return s / (months / 12);
    };
    expect(monthMean(8) - monthMean(2)).toBeGreaterThan(DEMO_BUDGET.verticalAdvection.seasonal);
    const first = b.airSeaFlux.slice(0, 60).reduce((a, v) => a + v, 0) / 60;
    const last = b.airSeaFlux.slice(-60).reduce((a, v) => a + v, 0) / 60;
    expect(last - first).toBeCloseTo(DEMO_BUDGET.airSeaFlux.trendPerYear * 15, 2);
  });
});

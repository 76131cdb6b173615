import { anomaly, budget, detectEvents, pearson } from '@upwell/common';
import { describe, expect, it } from 'vitest';
import { BUDGET_RESIDUAL_MAX, BUDGET_TERMS } from './carbon-budget';
import { generateDemoScenario, RELEASE_2_CHANGES } from './demo-scenario';

const r1 = generateDemoScenario({ release: 1 });
const r2 = generateDemoScenario({ release: 2 });
// The engine's operational defaults as the figures use them (CPC ONI rule, common practice; WMO-No. 1203 base 1991–2020).
const BASE = { from: '1991-01', to: '2020-12' };
const anomalyOf = (values: Float64Array) => anomaly({ series: { start: r1.start, values: Array.from(values) }, base: BASE }).anomaly.values as number[];

describe('generateDemoScenario()', () => {
  it('gives identical numbers for the same seed and release, and others for another seed', () => {
    expect(generateDemoScenario({ release: 1 })).toEqual(r1);
    expect(generateDemoScenario({ seed: 8, release: 1 }).index).not.toEqual(r1.index);
  });

  it('yields warm and cold events of several strengths under the engine rule (±0.5 °C, 5 months, 3-month mean, base 1991–2020)', () => {
    const { events } = detectEvents({ index: { start: r1.start, values: anomalyOf(r1.index) }, threshold: 0.5, minDuration: 5, smooth: 3 });
    const warm = events.filter((e) => e.phase === 'warm');
    const cold = events.filter((e) => e.phase === 'cold');
    expect(warm.length).toBeGreaterThanOrEqual(2);
    expect(cold.length).toBeGreaterThanOrEqual(2);
    expect(Math.max(...warm.map((e) => e.peakValue))).toBeGreaterThan(2); // one very strong warm event (≥ 2.0, common practice)
    expect(new Set(events.map((e) => e.strength)).size).toBeGreaterThanOrEqual(3);
  });

  it('is an absolute SST around 27 °C whose deseasonalised sd is 0.7–1.1 °C', () => {
    const mean = r1.index.reduce((a, b) => a + b, 0) / r1.months;
    expect(mean).toBeGreaterThan(26.5);
    expect(mean).toBeLessThan(27.5);
    const a = anomalyOf(r1.index);
    const sd = Math.sqrt(a.reduce((s, v) => s + v * v, 0) / a.length);
    expect(sd).toBeGreaterThan(0.7);
    expect(sd).toBeLessThan(1.1);
  });

  it('closes the budget under the engine budget(): every |residual| ≤ BUDGET_RESIDUAL_MAX, in both releases', () => {
    for (const s of [r1, r2]) {
      const terms = Object.fromEntries(BUDGET_TERMS.map((t) => [t, { start: s.start, values: Array.from(s.budget[t]) }]));
      const b = budget({ tendency: { start: s.start, values: Array.from(s.budget.tendency) }, terms });
      const worst = Math.max(...b.residual.values.map((v) => Math.abs(v!)));
      expect(worst).toBeLessThanOrEqual(BUDGET_RESIDUAL_MAX + 1e-9);
      expect(b.relativeResidual!).toBeLessThan(0.05);
    }
  });

  it('slows the upwelling supply in warm events: index vs vertical-advection anomaly correlate negatively at lags 0–3 months', () => {
    const t = anomalyOf(r1.index);
    const w = anomalyOf(r1.budget.verticalAdvection);
    for (let lag = 0; lag <= 3; lag++) {
      const r = pearson(t.slice(0, t.length - lag), w.slice(lag))!;
      expect(r, `lag ${lag}`).toBeLessThan(-0.5);
    }
  });

  it('outgasses (air–sea flux < 0, positive into the ocean) and outgasses less in warm events', () => {
    const flux = r1.budget.airSeaFlux;
    expect(flux.reduce((a, b) => a + b, 0) / r1.months).toBeLessThan(-0.3);
    const r = pearson(anomalyOf(r1.index).slice(0, -2), anomalyOf(flux).slice(2))!;
    expect(r).toBeGreaterThan(0.5);
  });

  it('integrates the tendency into the 0–100 m inventory (monthly step 1/12 yr)', () => {
    let expected = r1.inventories.upper[0] - r1.budget.tendency[0] / 12;
    for (let i = 0; i < r1.months; i++) {
      expected += r1.budget.tendency[i] / 12;
      expect(r1.inventories.upper[i]).toBeCloseTo(expected, 3);
    }
    expect(r1.inventories.fullDepth[r1.months - 1]).toBeGreaterThan(r1.inventories.fullDepth[0]); // slow uptake
  });

  it('release 2 changes only biology and flux from 2010 on, by a few percent, and keeps the index', () => {
    expect(r2.index).toEqual(r1.index);
    expect(r2.field).toEqual(r1.field);
    const from = (RELEASE_2_CHANGES.fromYear - 1980) * 12;
    expect(r2.budget.biology.slice(0, from)).toEqual(r1.budget.biology.slice(0, from));
    expect(r2.budget.verticalAdvection).toEqual(r1.budget.verticalAdvection);
    let changed = 0;
    for (let i = from; i < r1.months; i++) {
      const rel = Math.abs(r2.budget.biology[i] - r1.budget.biology[i]) / Math.abs(r1.budget.biology[i]);
      expect(rel).toBeLessThan(0.05); // "small changes": under 5 % of the term
      if (rel > 0.01) changed++;
      expect(Math.abs(r2.budget.airSeaFlux[i] - r1.budget.airSeaFlux[i])).toBeLessThan(0.02);
    }
    expect(changed).toBeGreaterThan((r1.months - from) / 2);
  });
});

import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sampleCorrelation, linearRegression } from 'simple-statistics';
import { runAnomaly, runBudget, runComposite, runEvents, runIntegrate, runLagCorrelation, runTrend } from '../src/analysis/analysis-routes';
import { startTestApp, type TestApp } from './test-app';
import { buildUser, type TestUser } from './factories';
import { mulberry32 } from '@upwell/common';

// The check data are fixed by a seed on the engine's one PRNG (mulberry32, common/src/stats/prng.ts).
const seeded = mulberry32;

/** 40 years of a monthly index with a seasonal cycle, an oscillation and noise; and a carbon series lagging it by 3 months. */
function demoPair() {
  const rnd = seeded(42);
  const n = 480;
  const index: number[] = [];
  for (let t = 0; t < n; t++) index.push(1.4 * Math.sin((2 * Math.PI * t) / 50) + 0.3 * Math.cos((2 * Math.PI * t) / 12) + 0.3 * (rnd() - 0.5));
  const carbon = index.map((_, t) => (t >= 3 ? -0.8 * index[t - 3] : null)).map((v) => (v === null ? null : v + 0.2 * (rnd() - 0.5)));
  return { index: { start: '1980-01', values: index }, carbon: { start: '1980-01', values: carbon } };
}

describe('POST /api/analysis/* over HTTP', () => {
  let t: TestApp;
  let u: TestUser;
  beforeAll(async () => {
    t = await startTestApp();
    u = await buildUser(t.url);
  });
  afterAll(() => t.close());
  const post = (name: string, body: unknown) => request(t.url).post(`/api/analysis/${name}`).set(u.auth).send(body as object);
  const { index, carbon } = demoPair();

  it('anomaly answers { anomaly, climatology } exactly as the engine function does', async () => {
    const body = { series: index, base: { from: '1981-01', to: '2010-12' } };
    const res = await post('anomaly', body).expect(200);
    expect(res.body).toEqual(JSON.parse(JSON.stringify(runAnomaly(body))));
    expect(res.body.climatology).toHaveLength(12);
    expect(res.body.anomaly.start).toBe('1980-01');
    expect(res.body.anomaly.values).toHaveLength(480);
  });

  it('lag-correlation answers every lag from −maxLag to +maxLag; lag 0 agrees with simple-statistics', async () => {
    const body = { x: index, y: carbon, maxLag: 12 };
    const res = await post('lag-correlation', body).expect(200);
    expect(res.body).toEqual(JSON.parse(JSON.stringify(runLagCorrelation(body))));
    expect(res.body.lags.map((l: { lag: number }) => l.lag)).toEqual(Array.from({ length: 25 }, (_, i) => i - 12));
    const pairs = index.values.map((x, i) => [x, carbon.values[i]] as const).filter(([, y]) => y !== null) as [number, number][];
    const zero = res.body.lags.find((l: { lag: number }) => l.lag === 0);
    // Independent reference: simple-statistics' sample correlation of the paired values.
    expect(zero.r).toBeCloseTo(sampleCorrelation(pairs.map((p) => p[0]), pairs.map((p) => p[1])), 10);
    expect(zero.n).toBe(pairs.length);
    // The carbon series was built to lag the index by 3 months with a negative sign.
    const strongest = res.body.lags.reduce((a: { r: number }, b: { r: number }) => (Math.abs(b.r) > Math.abs(a.r) ? b : a));
    expect(strongest.lag).toBe(3);
    expect(strongest.r).toBeLessThan(-0.9);
    expect(strongest.nEff).toBeLessThan(strongest.n);
  });

  it('events, composite, trend, budget and integrate match their engine functions', async () => {
    const events = { index, threshold: 0.5, minDuration: 5 };
    const ev = await post('events', events).expect(200);
    expect(ev.body).toEqual(JSON.parse(JSON.stringify(runEvents(events))));
    expect(ev.body.events.some((e: { phase: string }) => e.phase === 'warm')).toBe(true);
    expect(ev.body.events.some((e: { phase: string }) => e.phase === 'cold')).toBe(true);

    const warmPeaks = ev.body.events.filter((e: { phase: string }) => e.phase === 'warm').map((e: { peak: string }) => ({ at: e.peak }));
    const composite = { series: carbon, events: warmPeaks, before: 6, after: 12 };
    const comp = await post('composite', composite).expect(200);
    expect(comp.body).toEqual(JSON.parse(JSON.stringify(runComposite(composite))));
    expect(comp.body.offsets).toHaveLength(19);

    const trendBody = { series: { start: '2000-01', values: Array.from({ length: 120 }, (_, i) => 2 + 0.01 * i) }, per: 'decade' };
    const tr = await post('trend', trendBody).expect(200);
    expect(tr.body).toEqual(JSON.parse(JSON.stringify(runTrend(trendBody as Parameters<typeof runTrend>[0]))));
    // 0.01 per month is 0.12 per year, 1.2 per decade; simple-statistics fits the same line.
    const ss = linearRegression(trendBody.series.values.map((v, i) => [i / 12, v]));
    expect(tr.body.slope).toBeCloseTo(ss.m * 10, 9);
    expect(tr.body.intercept).toBeCloseTo(ss.b, 9);

    const budget = {
      tendency: { start: '2000-01', values: [3, 3, 3] },
      terms: { advection: { start: '2000-01', values: [1, 1, 1] }, flux: { start: '2000-01', values: [1.5, 2, 2.5] } },
    };
    const bu = await post('budget', budget).expect(200);
    expect(bu.body).toEqual(JSON.parse(JSON.stringify(runBudget(budget))));
    expect(bu.body.residual.values).toEqual([0.5, 0, -0.5]);

    // 1 Pg C/yr over January..December 2001 (365 days) with the Julian year of 365.25 days: 365/365.25 Pg C.
    const integ = { series: { start: '2001-01', values: Array(12).fill(1) }, units: 'Pg C/yr', from: '2001-01', to: '2001-12' };
    const ig = await post('integrate', integ).expect(200);
    expect(ig.body).toEqual(JSON.parse(JSON.stringify(runIntegrate(integ))));
    expect(ig.body.total).toBeCloseTo(365 / 365.25, 12);
  });

  it('integrate honours the series calendar: 12 months of 1 Pg C/yr in 360_day make 360/365.25 Pg C (CF 1.11 §4.4.1: 30-day months)', async () => {
    const body = { series: { start: '2001-01', values: Array(12).fill(1) }, units: 'Pg C/yr', from: '2001-01', to: '2001-12', calendar: '360_day' };
    const res = await post('integrate', body).expect(200);
    expect(res.body.total).toBeCloseTo(360 / 365.25, 12);
    await post('integrate', { ...body, calendar: 'lunar' }).expect(400);
  });

  it('lag-correlation answers strongest { lag, r, n, nEff, p, pSearch } with the surrogates asked for, and trend the adjusted SE fields', async () => {
    const body = { x: index, y: carbon, maxLag: 12, surrogates: 200, seed: 3, significance: 'phase-randomised' };
    const res = await post('lag-correlation', body).expect(200);
    expect(Object.keys(res.body.strongest).sort()).toEqual(['lag', 'n', 'nEff', 'p', 'pSearch', 'r']);
    expect(res.body.strongest.lag).toBe(3);
    expect(res.body.strongest.pSearch).toBe(0);
    // Without `surrogates` the route draws 1000 (issue 14 contract), so pSearch is a multiple of 1/1000.
    const plain = await post('lag-correlation', { x: index, y: carbon, maxLag: 12 }).expect(200);
    expect(Number.isInteger(plain.body.strongest.pSearch * 1000)).toBe(true);
    const tr = await post('trend', { series: index }).expect(200);
    for (const key of ['slopeStdErrAdjusted', 'nEffResiduals', 'pAdjusted']) expect(tr.body).toHaveProperty(key);
    expect(tr.body.slopeStdErrAdjusted).toBeGreaterThan(tr.body.slopeStdErr);
  });

  it('needs sign-in', async () => {
    await request(t.url).post('/api/analysis/trend').send({ series: { start: '2000-01', values: [1, 2, 3] } }).expect(401);
  });

  const bad: [string, string, unknown, string][] = [
    ['anomaly', 'a malformed month', { series: { start: '2000-13', values: [1] }, base: { from: '2000-01', to: '2000-12' } }, 'YYYY-MM'],
    ['anomaly', 'a reversed base period', { series: index, base: { from: '2010-01', to: '2000-12' } }, 'base'],
    ['lag-correlation', 'a negative maxLag', { x: index, y: carbon, maxLag: -1 }, 'maxLag'],
    ['lag-correlation', 'a huge maxLag', { x: index, y: carbon, maxLag: 100000 }, 'maxLag'],
    ['lag-correlation', 'text in the values', { x: { start: '2000-01', values: ['1', 2] }, y: carbon, maxLag: 1 }, 'values'],
    ['composite', 'unsorted event dates', { series: carbon, events: [{ at: '1990-01' }, { at: '1985-01' }], before: 1, after: 1 }, 'strictly increasing'],
    ['composite', 'duplicate event dates', { series: carbon, events: [{ at: '1990-01' }, { at: '1990-01' }], before: 1, after: 1 }, 'duplicate'],
    ['events', 'an even smoothing width', { index, smooth: 4 }, 'odd'],
    ['integrate', 'a unit that is not a rate', { series: { start: '2001-01', values: [1] }, units: 'Pg C', from: '2001-01', to: '2001-01' }, 'Pg C'],
    ['trend', 'no body', undefined, 'JSON object'],
  ];
  for (const [route, what, body, fragment] of bad) {
    it(`${route} refuses ${what} with 400 saying what was wrong`, async () => {
      const res = await post(route, body).expect(400);
      expect(res.body.message).toContain(fragment);
    });
  }

  it('lists every analysis route in the OpenAPI document', async () => {
    const doc = await request(t.url).get('/api/docs/openapi.json').expect(200);
    for (const name of ['anomaly', 'lag-correlation', 'events', 'composite', 'trend', 'budget', 'integrate']) {
      expect(doc.body.paths[`/api/analysis/${name}`]?.post?.requestBody).toBeDefined();
    }
  });
});

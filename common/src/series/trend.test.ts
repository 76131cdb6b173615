import { describe, expect, it } from 'vitest';
import { fixtureText, nino12Series } from '../../test-fixtures/read-fixture';
import { anomaly } from './anomaly';
import { linearRegression } from 'simple-statistics';
import { trend } from './trend';

describe('trend()', () => {
  it('fits value on time in years from the first month (month i at i/12) — compared with simple-statistics linearRegression()', () => {
    const values = Array.from({ length: 120 }, (_, i) => 2.1 + 0.03 * (i / 12) + 0.2 * Math.sin(i));
    const ref = linearRegression(values.map((v, i) => [i / 12, v]));
    const res = trend({ series: { start: '1990-01', values } });
    expect(res.slope).toBeCloseTo(ref.m, 12);
    expect(res.intercept).toBeCloseTo(ref.b, 12);
    expect(res.n).toBe(120);
  });

  it('recovers an exact line: 0.5 units/yr is 5 units/decade, stdErr 0, R² 1', () => {
    const values = Array.from({ length: 36 }, (_, i) => 10 + 0.5 * (i / 12));
    const yr = trend({ series: { start: '2000-01', values } });
    const dec = trend({ series: { start: '2000-01', values }, per: 'decade' });
    expect(yr.slope).toBeCloseTo(0.5, 12);
    expect(dec.slope).toBeCloseTo(5, 11);
    expect(yr.intercept).toBeCloseTo(10, 12);
    expect(dec.intercept).toBeCloseTo(10, 12);
    expect(yr.slopeStdErr as number).toBeLessThan(1e-12);
    expect(yr.r2).toBeCloseTo(1, 12);
  });

  it('multiplies the slope standard error by 10 per decade', () => {
    const values = Array.from({ length: 60 }, (_, i) => Math.cos(i * 2.3) + i / 100);
    const yr = trend({ series: { start: '2000-01', values } });
    const dec = trend({ series: { start: '2000-01', values }, per: 'decade' });
    expect(dec.slopeStdErr).toBeCloseTo((yr.slopeStdErr as number) * 10, 12);
  });

  it('skips missing months but keeps their time positions', () => {
    const res = trend({ series: { start: '2000-01', values: [0, null, 2 / 12, null, 4 / 12] } });
    expect(res.slope).toBeCloseTo(1, 12);
    expect(res.n).toBe(3);
  });

  it('returns nulls for empty input or one value, and null R² for a constant series', () => {
    expect(trend({ series: { start: '2000-01', values: [] } }).slope).toBeNull();
    expect(trend({ series: { start: '2000-01', values: [3] } }).slope).toBeNull();
    const flat = trend({ series: { start: '2000-01', values: [3, 3, 3, 3] } });
    expect(flat.slope).toBe(0);
    expect(flat.r2).toBeNull();
  });
});

describe('trend() — standard error adjusted for autocorrelated residuals (Santer et al. 2000)', () => {
  // Reference: common/test-fixtures/scripts/trend-santer.py — statsmodels 0.13.5 OLS, the Santer et al.
  // (2000) adjustment with r1 by the NIST definition, scipy 1.10 t distribution. Second opinion in the same
  // file: Newey–West (HAC, 12 lags) gives SE 0.00546 °C/yr and t 2.46 on the Niño 1+2 anomalies, between
  // the OLS (t 6.07) and the AR(1)-adjusted (t 1.29) answers.
  const ref = JSON.parse(fixtureText('trend-santer.json'));

  it('gives t ≈ 6.07 (OLS) and ≈ 1.29 (adjusted) on the Niño 1+2 anomalies against 1971–2000, as issue 14 reports (6.07 → 1.28)', () => {
    const r = ref.nino12Anomalies1971to2000;
    const series = anomaly({ series: nino12Series(), base: { from: '1971-01', to: '2000-12' } }).anomaly;
    const t = trend({ series });
    expect(t.slope as number).toBeCloseTo(r.slope, 12);
    expect(t.slopeStdErr as number).toBeCloseTo(r.slopeStdErr, 12);
    expect(t.nEffResiduals as number).toBeCloseTo(r.nEffResiduals, 8);
    expect(t.slopeStdErrAdjusted as number).toBeCloseTo(r.slopeStdErrAdjusted, 12);
    expect(t.pAdjusted as number).toBeCloseTo(r.pAdjusted, 8);
    expect((t.slope as number) / (t.slopeStdErr as number)).toBeCloseTo(6.07, 2);
    expect((t.slope as number) / (t.slopeStdErrAdjusted as number)).toBeCloseTo(1.288, 3);
  });

  it('matches the same reference on a seeded AR(1) series with gaps, per year and per decade', () => {
    const r = ref.synthetic;
    const year = trend({ series: { start: r.start, values: r.values } });
    const decade = trend({ series: { start: r.start, values: r.values }, per: 'decade' });
    expect(year.n).toBe(r.n);
    expect(year.nEffResiduals as number).toBeCloseTo(r.nEffResiduals, 8);
    expect(year.slopeStdErrAdjusted as number).toBeCloseTo(r.slopeStdErrAdjusted, 10);
    expect(decade.slopeStdErrAdjusted as number).toBeCloseTo(10 * r.slopeStdErrAdjusted, 9);
    expect(year.pAdjusted as number).toBeCloseTo(r.pAdjusted, 8);
  });

  it('leaves the adjusted statistics null when no residual autocorrelation is defined (constant series, empty input)', () => {
    const exact = trend({ series: { start: '2000-01', values: [4, 4, 4, 4, 4] } });
    expect(exact.nEffResiduals).toBeNull();
    expect(exact.pAdjusted).toBeNull();
    expect(trend({ series: { start: '2000-01', values: [] } })).toMatchObject({ slopeStdErrAdjusted: null, nEffResiduals: null, pAdjusted: null });
  });
});

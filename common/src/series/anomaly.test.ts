import { linearRegression } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { fixtureText, nino12Series } from '../../test-fixtures/read-fixture';
import { mean } from '../stats/mean';
import { sampleSd } from '../stats/welford';
import { AnalysisInputError } from './analysis-input-error';
import { anomaly } from './anomaly';

/** A 40-year synthetic series 1961-01.. with an annual cycle, a trend and deterministic noise. */
function synthetic(): number[] {
  return Array.from({ length: 480 }, (_, i) => 10 + 3 * Math.cos((2 * Math.PI * i) / 12) + 0.01 * i + Math.sin(i * 1.7));
}

describe('anomaly() — monthly-mean climatology', () => {
  it('computes climatology[m] as the mean of month m in the base period and anomaly = value − climatology', () => {
    const values = synthetic();
    const res = anomaly({ series: { start: '1961-01', values }, base: { from: '1961-01', to: '1990-12' } });
    const januaries = Array.from({ length: 30 }, (_, y) => values[y * 12]);
    expect(res.climatology[0]).toBeCloseTo(mean(januaries) as number, 12);
    expect(res.anomaly.values[12 * 35]).toBeCloseTo(values[12 * 35] - (res.climatology[0] as number), 12);
    expect(res.warnings).toEqual([]);
  });

  it('checks the real Niño 1+2 table (statsmodels copy): 1983-03 = 28.85 and 1998-03 = 29.24 °C', () => {
    const s = nino12Series();
    expect(s.values[(1983 - 1950) * 12 + 2]).toBe(28.85);
    expect(s.values[(1998 - 1950) * 12 + 2]).toBe(29.24);
    const res = anomaly({ series: s, base: { from: '1971-01', to: '2000-12' } });
    // March climatology 1971–2000 = mean of the 30 Marches; the 1998-03 anomaly is far above it.
    const marches = Array.from({ length: 30 }, (_, y) => s.values[(1971 - 1950 + y) * 12 + 2]);
    expect(res.climatology[2]).toBeCloseTo(mean(marches) as number, 12);
    expect(res.anomaly.values[(1998 - 1950) * 12 + 2] as number).toBeGreaterThan(2);
  });

  it('leaves a month null when fewer than minYears values exist (default 80% rounded up: 24 of 30, WMO-No. 1203)', () => {
    const values: (number | null)[] = synthetic();
    // Remove 7 Februaries of 1961–1990: 23 of 30 remain < 24.
    for (let y = 0; y < 7; y++) values[y * 12 + 1] = null;
    const res = anomaly({ series: { start: '1961-01', values }, base: { from: '1961-01', to: '1990-12' } });
    expect(res.climatology[1]).toBeNull();
    expect(res.climatology[0]).not.toBeNull();
    expect(res.anomaly.values.filter((_, i) => i % 12 === 1).every((v) => v === null)).toBe(true);
    expect(res.warnings.join()).toMatch(/Feb.*23 of 30.*minYears = 24/);
    // With 6 removed, 24 remain: accepted.
    values[6 * 12 + 1] = 1;
    expect(anomaly({ series: { start: '1961-01', values }, base: { from: '1961-01', to: '1990-12' } }).climatology[1]).not.toBeNull();
  });

  it('honours an explicit minYears', () => {
    const values: (number | null)[] = synthetic();
    for (let y = 0; y < 20; y++) values[y * 12 + 4] = null;
    const res = anomaly({ series: { start: '1961-01', values }, base: { from: '1961-01', to: '1990-12' }, minYears: 10 });
    expect(res.climatology[4]).not.toBeNull();
  });

  it('gives null climatology and anomalies with warnings when the series is shorter than the base period', () => {
    const res = anomaly({ series: { start: '1981-01', values: synthetic().slice(0, 120) }, base: { from: '1961-01', to: '1990-12' } });
    expect(res.climatology.every((c) => c === null)).toBe(true);
    expect(res.anomaly.values.every((v) => v === null)).toBe(true);
    expect(res.warnings[0]).toMatch(/only part of the base period/);
  });

  it('warns when the base period misses the series entirely', () => {
    const res = anomaly({ series: { start: '2001-01', values: [1, 2, 3] }, base: { from: '1961-01', to: '1990-12' } });
    expect(res.warnings[0]).toMatch(/does not overlap/);
    expect(res.anomaly.values).toEqual([null, null, null]);
  });

  it('handles empty input and a single value', () => {
    const empty = anomaly({ series: { start: '2001-01', values: [] }, base: { from: '2001-01', to: '2001-12' } });
    expect(empty.anomaly.values).toEqual([]);
    expect(empty.warnings[0]).toBe('series is empty');
    const one = anomaly({ series: { start: '2001-01', values: [5] }, base: { from: '2001-01', to: '2001-01' } });
    expect(one.anomaly.values).toEqual([0]);
  });

  it('rejects a base period that ends before it starts', () => {
    expect(() => anomaly({ series: { start: '2001-01', values: [1] }, base: { from: '2001-02', to: '2001-01' } })).toThrow(AnalysisInputError);
  });

  it('keeps anomalies exact for values near 1e8 (NumAcc-style offset)', () => {
    const values = synthetic().map((v) => v + 1e8);
    const res = anomaly({ series: { start: '1961-01', values }, base: { from: '1961-01', to: '1990-12' } });
    const ref = anomaly({ series: { start: '1961-01', values: synthetic() }, base: { from: '1961-01', to: '1990-12' } });
    for (let i = 0; i < 480; i += 37) expect(Math.abs((res.anomaly.values[i] as number) - (ref.anomaly.values[i] as number))).toBeLessThan(1e-7);
  });
});

describe('anomaly() — harmonic climatology', () => {
  it('recovers an exact two-harmonic annual cycle from noisy monthly data', () => {
    const values = Array.from({ length: 360 }, (_, i) => 5 + 2 * Math.cos((2 * Math.PI * i) / 12) + Math.sin((4 * Math.PI * i) / 12));
    const res = anomaly({ series: { start: '1961-01', values }, base: { from: '1961-01', to: '1990-12' }, method: 'harmonic' });
    for (let m = 0; m < 12; m++) expect(res.climatology[m]).toBeCloseTo(values[m], 12);
    expect(Math.max(...res.anomaly.values.map((v) => Math.abs(v as number)))).toBeLessThan(1e-12);
  });

  it('has the same annual mean as the monthly-mean climatology on complete data (5 harmonics)', () => {
    // 11 parameters on 12 months: the fits differ only by the 6th-harmonic part cos(πm), whose annual mean is 0.
    const values = synthetic();
    const h = anomaly({ series: { start: '1961-01', values }, base: { from: '1961-01', to: '1990-12' }, method: 'harmonic', harmonics: 5 });
    const mm = anomaly({ series: { start: '1961-01', values }, base: { from: '1961-01', to: '1990-12' } });
    const meanH = (h.climatology as number[]).reduce((a, b) => a + b) / 12;
    const meanM = (mm.climatology as number[]).reduce((a, b) => a + b) / 12;
    expect(meanH).toBeCloseTo(meanM, 12);
  });

  it('is null with a warning when too few calendar months hold data for the harmonics asked', () => {
    const values = Array.from({ length: 36 }, (_, i) => (i % 12 < 3 ? 1 : null));
    const res = anomaly({ series: { start: '2000-01', values }, base: { from: '2000-01', to: '2002-12' }, method: 'harmonic', harmonics: 2 });
    expect(res.climatology.every((c) => c === null)).toBe(true);
    expect(res.warnings[0]).toMatch(/3 calendar months.*5 are needed/);
  });
});

describe('anomaly() — detrend, standardize, smooth', () => {
  // Replaces the test of the former sequential detrend (climatology first, then an OLS line through
  // the anomalies), which issue 14 item 4 retired because the base-period trend leaked into the means.
  it('detrend fits line and monthly means jointly: the result matches statsmodels OLS with month dummies and every calendar month averages zero', () => {
    // Reference: common/test-fixtures/scripts/joint-trend-season.py (statsmodels 0.13.5).
    const ref = JSON.parse(fixtureText('joint-trend-season.json')).co2Like;
    const base = { from: '1960-03', to: '1974-02' };
    const res = anomaly({ series: { start: ref.start, values: ref.values }, base, detrend: true });
    res.anomaly.values.forEach((v, i) => (ref.residuals[i] === null ? expect(v).toBeNull() : expect(v as number).toBeCloseTo(ref.residuals[i], 8)));
    for (let m = 0; m < 12; m++) {
      const month = res.anomaly.values.filter((v, i) => (2 + i) % 12 === m && v !== null) as number[];
      expect(Math.abs(mean(month) as number)).toBeLessThan(1e-9);
      // The sequential method leaves up to ±0.6 here (same script): the leak the joint fit removes.
    }
    expect(Math.max(...ref.sequentialCalendarMonthMeans.map(Math.abs))).toBeGreaterThan(0.3);
    expect(linearRegression(res.anomaly.values.map((v, i) => [i, v ?? 0]).filter((_, i) => res.anomaly.values[i] !== null)).m).toBeCloseTo(0, 10);
  });

  it('detrend reports as climatology the fitted seasonal level at the middle of the base period', () => {
    const ref = JSON.parse(fixtureText('joint-trend-season.json')).co2Like;
    const res = anomaly({ series: { start: ref.start, values: ref.values }, base: { from: '1961-01', to: '1970-12' }, detrend: true });
    // Base-period middle = index of 1965-12/1966-01 midpoint from 1960-03: (10 + 129) / 2.
    for (let m = 0; m < 12; m++) expect(res.climatology[m] as number).toBeCloseTo(ref.monthlyIntercepts[m] + ref.slopePerMonth * ((10 + 129) / 2), 8);
  });

  it('takes "whole-record" as the base period from the first to the last month of the series', () => {
    const values = synthetic();
    const whole = anomaly({ series: { start: '1961-01', values }, base: 'whole-record' });
    const explicit = anomaly({ series: { start: '1961-01', values }, base: { from: '1961-01', to: '2000-12' } });
    expect(whole).toEqual(explicit);
    // A 1998–2020 run against the default 1991–2020 normal is empty; against its whole record it is not (issue 14 item 6).
    const run = { start: '1998-01', values: values.slice(0, 276) };
    expect(anomaly({ series: run, base: { from: '1991-01', to: '2020-12' } }).anomaly.values.every((v) => v === null)).toBe(true);
    expect(anomaly({ series: run, base: 'whole-record' }).anomaly.values.every((v) => v !== null)).toBe(true);
    expect(anomaly({ series: run, base: { from: '1991-01', to: '2020-12' }, minYears: 20 }).anomaly.values.every((v) => v !== null)).toBe(true);
  });

  it('standardize divides by the base-period sd (n − 1) of each calendar month', () => {
    const values = synthetic();
    const raw = anomaly({ series: { start: '1961-01', values }, base: { from: '1961-01', to: '1990-12' } });
    const std = anomaly({ series: { start: '1961-01', values }, base: { from: '1961-01', to: '1990-12' }, standardize: true });
    const julyAnoms = Array.from({ length: 30 }, (_, y) => raw.anomaly.values[y * 12 + 6]);
    const sd = sampleSd(julyAnoms) as number;
    expect(std.anomaly.values[6 + 12 * 33]).toBeCloseTo((raw.anomaly.values[6 + 12 * 33] as number) / sd, 12);
  });

  it('standardize gives null with a warning for a month with zero sd (constant series)', () => {
    const res = anomaly({ series: { start: '2000-01', values: new Array(36).fill(4) }, base: { from: '2000-01', to: '2002-12' }, standardize: true });
    expect(res.anomaly.values.every((v) => v === null)).toBe(true);
    expect(res.warnings.length).toBe(12);
  });

  it('smooth applies a centred running mean last, null at the ends', () => {
    const values = synthetic();
    const raw = anomaly({ series: { start: '1961-01', values }, base: { from: '1961-01', to: '1990-12' } });
    const sm = anomaly({ series: { start: '1961-01', values }, base: { from: '1961-01', to: '1990-12' }, smooth: 3 });
    expect(sm.anomaly.values[0]).toBeNull();
    const r = raw.anomaly.values as number[];
    expect(sm.anomaly.values[10]).toBeCloseTo((r[9] + r[10] + r[11]) / 3, 12);
  });
});

describe('anomaly() — sliding 30-year base periods (NOAA CPC ONI practice, centred, updated every 5 years)', () => {
  // 1950-01 .. 2024-12 with a trend: a month of 2003 is measured against 1986–2015, one of 1953 against
  // 1936–1965 shifted to the data (1950–1979), one of 2022 against the latest 30 complete years (1995–2024).
  const values = Array.from({ length: 75 * 12 }, (_, i) => 20 + 2 * Math.cos((2 * Math.PI * i) / 12) + 0.002 * i + 0.3 * Math.sin(i * 0.7));
  const res = anomaly({ series: { start: '1950-01', values }, base: 'sliding-30yr' });
  const meanOf = (month: number, from: number, to: number) => mean(Array.from({ length: to - from + 1 }, (_, k) => values[(from - 1950 + k) * 12 + month])) as number;

  it('subtracts, month by month, the mean of that calendar month over the block’s base period', () => {
    for (const [year, month, from, to] of [[2003, 6, 1986, 2015], [1953, 0, 1950, 1979], [2022, 11, 1995, 2024], [1961, 3, 1950, 1979], [1966, 3, 1951, 1980]]) {
      const i = (year - 1950) * 12 + month;
      expect(res.anomaly.values[i] as number).toBeCloseTo(values[i] - meanOf(month, from, to), 12);
    }
    expect(res.climatology[0] as number).toBeCloseTo(meanOf(0, 1995, 2024), 12);
  });

  it('follows a trend that a fixed base leaves in the anomalies, and refuses detrend with it', () => {
    const fixed = anomaly({ series: { start: '1950-01', values }, base: { from: '1991-01', to: '2020-12' } });
    const early = (r: typeof res) => Math.abs(mean(r.anomaly.values.slice(0, 120)) as number);
    expect(early(res)).toBeLessThan(early(fixed) / 3);
    expect(() => anomaly({ series: { start: '1950-01', values }, base: 'sliding-30yr', detrend: true })).toThrow(AnalysisInputError);
  });
});

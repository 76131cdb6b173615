import { describe, expect, it } from 'vitest';
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

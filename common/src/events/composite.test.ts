import { describe, expect, it } from 'vitest';
import tQuantile from '@stdlib/stats-base-dists-t-quantile';
import { AnalysisInputError } from '../series/analysis-input-error';
import { composite } from './composite';

describe('composite()', () => {
  const series = { start: '2000-01', values: Array.from({ length: 48 }, (_, i) => i % 12) as (number | null)[] };

  it('stacks the series at offsets −before..+after around each event, null outside the series', () => {
    const res = composite({ series, events: [{ at: '2000-02' }, { at: '2001-02' }, { at: '2003-12' }], before: 2, after: 1 });
    expect(res.offsets).toEqual([-2, -1, 0, 1]);
    expect(res.members).toEqual([
      [null, 0, 1, 2],
      [11, 0, 1, 2],
      [9, 10, 11, null],
    ]);
    expect(res.n).toEqual([2, 3, 3, 2]);
    expect(res.mean[1]).toBeCloseTo(10 / 3, 14);
  });

  it('gives the interval mean ± t((1+conf)/2, n−1)·s/√n with the @stdlib t quantile', () => {
    const s = { start: '2000-01', values: [1, 4, 2, 8, 5, 7] };
    const res = composite({ series: s, events: [{ at: '2000-01' }, { at: '2000-02' }, { at: '2000-03' }, { at: '2000-04' }], before: 0, after: 0, confidence: 0.9 });
    const v = [1, 4, 2, 8];
    const m = 15 / 4;
    const sd = Math.sqrt(v.reduce((a, x) => a + (x - m) ** 2, 0) / 3);
    const half = (tQuantile(0.95, 3) * sd) / 2;
    expect(res.mean[0]).toBeCloseTo(m, 14);
    expect(res.lower[0]).toBeCloseTo(m - half, 10);
    expect(res.upper[0]).toBeCloseTo(m + half, 10);
  });

  it('leaves the interval null where fewer than two members are present', () => {
    const res = composite({ series, events: [{ at: '2000-01' }, { at: '2003-12' }], before: 1, after: 1 });
    expect(res.n).toEqual([1, 2, 1]);
    expect(res.lower[0]).toBeNull();
    expect(res.upper[2]).toBeNull();
    expect(res.lower[1]).not.toBeNull();
  });

  it('skips missing values per offset and handles no events', () => {
    const s = { start: '2000-01', values: [1, null, 3, 4] };
    expect(composite({ series: s, events: [{ at: '2000-02' }, { at: '2000-03' }], before: 0, after: 0 }).n).toEqual([1]);
    const none = composite({ series: s, events: [], before: 1, after: 1 });
    expect(none.n).toEqual([0, 0, 0]);
    expect(none.mean).toEqual([null, null, null]);
  });

  it('rejects unsorted or duplicate event dates with a clear AnalysisInputError', () => {
    expect(() => composite({ series, events: [{ at: '2001-01' }, { at: '2000-01' }], before: 0, after: 0 })).toThrow(AnalysisInputError);
    expect(() => composite({ series, events: [{ at: '2001-01' }, { at: '2001-01' }], before: 0, after: 0 })).toThrow(/duplicate/);
  });
});

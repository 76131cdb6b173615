import { describe, expect, it } from 'vitest';
import { runningMean } from './running-mean';

describe('runningMean()', () => {
  it('averages t−1, t, t+1 for width 3 and is NaN where the window runs off the series', () => {
    const r = Array.from(runningMean(Float64Array.from([1, 2, 3, 4, 8]), 3));
    expect(r[0]).toBeNaN();
    expect(r.slice(1, 4)).toEqual([2, 3, 5]);
    expect(r[4]).toBeNaN();
  });

  it('is NaN wherever the window holds a missing value', () => {
    const r = runningMean(Float64Array.from([1, 2, NaN, 4, 5, 6, 7]), 3);
    expect([r[1], r[2], r[3]].every(Number.isNaN)).toBe(true);
    expect(r[4]).toBe(5);
  });

  it('copies for width 1, handles empty input, and rejects even widths', () => {
    expect(Array.from(runningMean(Float64Array.from([1, NaN]), 1))).toEqual([1, NaN]);
    expect(runningMean(new Float64Array(0), 3).length).toBe(0);
    expect(() => runningMean(new Float64Array(4), 2)).toThrow(RangeError);
  });
});

import { describe, expect, it } from 'vitest';
import { percentile, scaleLimits } from './scale-limits';

describe('scaleLimits() and percentile()', () => {
  it('follows numpy.percentile’s default linear rule: the 98th percentile of 1…100 is 98.02 (position 99·0.98 = 97.02)', () => {
    expect(percentile(Array.from({ length: 100 }, (_, i) => i + 1), 98)).toBeCloseTo(98.02, 12);
  });

  it('makes diverging limits symmetric about zero from |value|, so one extreme cell does not set them', () => {
    const values = [...Array.from({ length: 99 }, (_, i) => (i % 2 ? 1 : -1) * (i / 98)), -50, null];
    const [lo, hi] = scaleLimits(values, 'diverging')!;
    expect(lo).toBe(-hi);
    expect(hi).toBeLessThan(1.01);
  });

  it('gives sequential limits from the low and high percentiles, and null with no value', () => {
    expect(scaleLimits([1, 2, 3], 'sequential', 100)).toEqual([1, 3]);
    expect(scaleLimits([null, NaN], 'diverging')).toBeNull();
  });
});

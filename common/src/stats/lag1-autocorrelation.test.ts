import { describe, expect, it } from 'vitest';
import { NIST_UNIVARIATE } from '../../test-fixtures/nist-univariate';
import { lag1Autocorrelation } from './lag1-autocorrelation';

describe('lag1Autocorrelation()', () => {
  for (const c of NIST_UNIVARIATE) {
    it(`gives the NIST StRD certified lag-1 autocorrelation of ${c.name} (relative ${c.tol[2]})`, () => {
      expect(Math.abs((lag1Autocorrelation(c.data) as number) - c.r1) / Math.abs(c.r1)).toBeLessThanOrEqual(c.tol[2]);
    });
  }

  it('lets a gap break the lag-1 products but keep the gap-free ones', () => {
    // [1, 2, gap, 3, 4]: mean 2.5, products (1−2.5)(2−2.5) and (3−2.5)(4−2.5) only; Σd² = 5.
    expect(lag1Autocorrelation([1, 2, null, 3, 4])).toBeCloseTo((0.75 + 0.75) / 5, 15);
  });

  it('is null for a constant series, one value or empty input', () => {
    expect(lag1Autocorrelation([5, 5, 5])).toBeNull();
    expect(lag1Autocorrelation([5])).toBeNull();
    expect(lag1Autocorrelation([])).toBeNull();
  });

  it('handles values near 1e300 without overflow', () => {
    const r = lag1Autocorrelation([1e300, -1e300, 1e300, -1e300]) as number;
    // ȳ = 0, Σd² = 4e600, products 3 × −1e600 → −0.75.
    expect(r).toBeCloseTo(-0.75, 14);
  });
});

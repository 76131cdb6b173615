import { describe, expect, it } from 'vitest';
import { mean as ssMean } from 'simple-statistics';
import { NIST_UNIVARIATE } from '../../test-fixtures/nist-univariate';
import { mean } from './mean';

describe('mean()', () => {
  for (const c of NIST_UNIVARIATE) {
    it(`gives the NIST StRD certified mean of ${c.name} (relative ${c.tol[0]})`, () => {
      expect(Math.abs((mean(c.data) as number) - c.mean) / Math.abs(c.mean)).toBeLessThanOrEqual(c.tol[0]);
    });
  }

  it('agrees with simple-statistics mean() on Michelso', () => {
    const data = NIST_UNIVARIATE[1].data;
    expect(mean(data)).toBeCloseTo(ssMean(data), 12);
  });

  it('is null for empty or all-missing input and the value itself for one value', () => {
    expect(mean([])).toBeNull();
    expect(mean([null, NaN])).toBeNull();
    expect(mean([4.5])).toBe(4.5);
  });

  it('does not overflow for values near 1e308 and keeps 1e300-scale precision', () => {
    expect((mean([1.5e308, 1.5e308, 1.2e308]) as number) / 1.4e308).toBeCloseTo(1, 14);
    expect(mean([1e300, 3e300])).toBe(2e300);
  });
});

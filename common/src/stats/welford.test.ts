import { describe, expect, it } from 'vitest';
import { sampleStandardDeviation, sampleVariance as ssVariance } from 'simple-statistics';
import { NIST_UNIVARIATE } from '../../test-fixtures/nist-univariate';
import { sampleSd, sampleVariance, welford } from './welford';

describe('sampleSd() (Welford 1962)', () => {
  for (const c of NIST_UNIVARIATE) {
    it(`gives the NIST StRD certified standard deviation of ${c.name} (relative ${c.tol[1]})`, () => {
      expect(Math.abs((sampleSd(c.data) as number) - c.sd) / c.sd).toBeLessThanOrEqual(c.tol[1]);
    });
  }

  it('agrees with simple-statistics sampleStandardDeviation() on Lew and sampleVariance() on Michelso', () => {
    expect(sampleSd(NIST_UNIVARIATE[0].data)).toBeCloseTo(sampleStandardDeviation(NIST_UNIVARIATE[0].data), 10);
    const ours = sampleVariance(NIST_UNIVARIATE[1].data) as number;
    // Relative 1e-11: the two algorithms round differently at the 1e-13 level on this data.
    expect(Math.abs(ours - ssVariance(NIST_UNIVARIATE[1].data)) / ours).toBeLessThan(1e-11);
  });

  it('is null for fewer than two present values and 0 for a constant series', () => {
    expect(sampleSd([])).toBeNull();
    expect(sampleSd([3, null, NaN])).toBeNull();
    expect(sampleSd([2, 2, 2, 2])).toBe(0);
  });

  it('stays finite for values near 1e300 (sd of 1e300, 3e300 is √2·1e300)', () => {
    expect((sampleSd([1e300, 3e300]) as number) / (Math.SQRT2 * 1e300)).toBeCloseTo(1, 14);
  });

  it('skips missing values', () => {
    expect(welford([1, null, 3, NaN]).n).toBe(2);
    expect(welford([1, null, 3, NaN]).mean).toBe(2);
  });
});

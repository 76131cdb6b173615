import { describe, expect, it } from 'vitest';
import { logBeta } from './log-beta';
import { logGamma } from './log-gamma';

describe('logBeta()', () => {
  it('gives B(1/2, 1/2) = π and B(a, 1) = 1/a (closed forms)', () => {
    expect(logBeta(0.5, 0.5)).toBeCloseTo(Math.log(Math.PI), 14);
    expect(logBeta(7, 1)).toBeCloseTo(-Math.log(7), 14);
    expect(logBeta(5000, 1)).toBeCloseTo(-Math.log(5000), 13);
  });

  it('joins the direct lnΓ form smoothly at the switch to Stirling (a = 30)', () => {
    const direct = logGamma(29.999999) + logGamma(0.5) - logGamma(30.499999);
    expect(logBeta(30, 0.5)).toBeCloseTo(direct, 6);
    expect(logBeta(40, 35)).toBeCloseTo(logGamma(40) + logGamma(35) - logGamma(75), 10);
  });

  it('is symmetric', () => {
    expect(logBeta(3.5, 800)).toBe(logBeta(800, 3.5));
  });
});

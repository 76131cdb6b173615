import { describe, expect, it } from 'vitest';
import { logGamma } from './log-gamma';

describe('logGamma()', () => {
  it('gives ln Γ at known points: Γ(1/2) = √π, Γ(10) = 9!, Γ(1) = Γ(2) = 1 (relative 1e-14)', () => {
    expect(logGamma(0.5)).toBeCloseTo(0.5 * Math.log(Math.PI), 14);
    expect(logGamma(10) / Math.log(362880)).toBeCloseTo(1, 14);
    expect(Math.abs(logGamma(1))).toBeLessThan(1e-14);
    expect(Math.abs(logGamma(2))).toBeLessThan(1e-14);
  });

  it('follows Stirling for large x (x = 1e6, relative 1e-13)', () => {
    const x = 1e6;
    // Stirling series ln Γ(x) = (x − ½)ln x − x + ½ln 2π + 1/(12x) (Abramowitz & Stegun 6.1.41).
    const stirling = (x - 0.5) * Math.log(x) - x + 0.5 * Math.log(2 * Math.PI) + 1 / (12 * x);
    expect(Math.abs(logGamma(x) - stirling) / stirling).toBeLessThan(1e-13);
  });

  it('is NaN for x ≤ 0', () => {
    expect(logGamma(0)).toBeNaN();
    expect(logGamma(-1)).toBeNaN();
  });
});

import { describe, expect, it } from 'vitest';
import { incompleteBeta, incompleteBetaComplement } from './incomplete-beta';
import { inverseIncompleteBeta } from './inverse-incomplete-beta';

describe('incompleteBeta()', () => {
  it('matches closed forms: I_x(a,1) = x^a, I_x(1,b) = 1 − (1−x)^b, I_x(½,½) = (2/π)·asin √x', () => {
    for (const x of [0.001, 0.2, 0.5, 0.77, 0.999]) {
      expect(incompleteBeta(3.5, 1, x)).toBeCloseTo(Math.pow(x, 3.5), 14);
      expect(incompleteBeta(1, 2.25, x)).toBeCloseTo(1 - Math.pow(1 - x, 2.25), 14);
      expect(incompleteBeta(0.5, 0.5, x)).toBeCloseTo((2 / Math.PI) * Math.asin(Math.sqrt(x)), 14);
    }
  });

  it('is 0 at x = 0, 1 at x = 1 and NaN outside [0, 1]', () => {
    expect(incompleteBeta(2, 3, 0)).toBe(0);
    expect(incompleteBeta(2, 3, 1)).toBe(1);
    expect(incompleteBeta(2, 3, 1.5)).toBeNaN();
  });

  it('has a complement that adds to one', () => {
    expect(incompleteBeta(4, 9, 0.3) + incompleteBetaComplement(4, 9, 0.3)).toBeCloseTo(1, 14);
  });
});

describe('inverseIncompleteBeta()', () => {
  // Tolerance: 1e-12 relative in p, except where the root lies within 1e-4 of 1 (a = 600): there x
  // itself is resolved only to ~1e-16 absolute and I_x's slope magnifies that to ~1e-11.
  it('inverts incompleteBeta, including tiny roots (relative 1e-12; 1e-11 for roots near 1)', () => {
    for (const [a, b] of [[0.5, 0.5], [5, 0.5], [600, 0.5], [2, 7]]) {
      for (const p of [1e-12, 1e-4, 0.05, 0.5, 0.9]) {
        const x = inverseIncompleteBeta(p, a, b);
        expect(Math.abs(incompleteBeta(a, b, x) - p) / p).toBeLessThan(1 - x < 1e-4 ? 1e-11 : 1e-12);
      }
    }
  });
});

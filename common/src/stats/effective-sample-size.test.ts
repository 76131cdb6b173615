import { describe, expect, it } from 'vitest';
import { effectiveSampleSize } from './effective-sample-size';

// Bretherton, Widmann, Dymnikov, Wallace & Bladé (1999), J. Climate 12:1990–2009: nEff = n(1 − r1x·r1y)/(1 + r1x·r1y).
describe('effectiveSampleSize() (Bretherton et al. 1999)', () => {
  it('gives 42.1622 for N = 120, r1x = 0.8, r1y = 0.6 (check-values.json, Bretherton 1999 eq. 31)', () => {
    expect(effectiveSampleSize(120, 0.8, 0.6)).toBeCloseTo(42.1622, 4);
  });

  it('equals n for white-noise members and never exceeds n for opposite-signed r1', () => {
    expect(effectiveSampleSize(100, 0, 0.9)).toBe(100);
    expect(effectiveSampleSize(100, -0.5, 0.5)).toBe(100);
  });

  it('is clamped below at 3 for very red series', () => {
    expect(effectiveSampleSize(20, 0.99, 0.99)).toBe(3);
  });

  it('is null for n < 3 or an unknown r1', () => {
    expect(effectiveSampleSize(2, 0.1, 0.1)).toBeNull();
    expect(effectiveSampleSize(50, null, 0.1)).toBeNull();
  });
});

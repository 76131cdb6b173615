import { describe, expect, it } from 'vitest';
import { roundHalfAway } from './round-half-away';

describe('roundHalfAway()', () => {
  it('rounds halves away from zero: 0.45 → 0.5, −0.45 → −0.5, 0.25 → 0.3, 2.5 → 3 (decimals 1 and 0)', () => {
    expect(roundHalfAway(0.45, 1)).toBe(0.5);
    expect(roundHalfAway(-0.45, 1)).toBe(-0.5);
    expect(roundHalfAway(0.25, 1)).toBe(0.3);
    expect(roundHalfAway(2.5, 0)).toBe(3);
    expect(roundHalfAway(-2.5, 0)).toBe(-3);
  });

  it('decides the half on the decimal, not on binary noise: 0.15 × 3 (= 0.44999999999999996) and 1.005', () => {
    const noisy = 0.15 * 3;
    expect(noisy).not.toBe(0.45);
    expect(roundHalfAway(noisy, 1)).toBe(0.5);
    expect(roundHalfAway(1.005, 2)).toBe(1.01);
    expect(roundHalfAway(2.675, 2)).toBe(2.68);
  });

  it('rounds genuinely-below-half values down: 0.449 → 0.4, 0.49 → 0.5, 0.47 → 0.5', () => {
    expect(roundHalfAway(0.449, 1)).toBe(0.4);
    expect(roundHalfAway(0.49, 1)).toBe(0.5);
    expect(roundHalfAway(0.47, 1)).toBe(0.5);
  });

  it('returns zero without a sign and leaves non-finite values alone', () => {
    expect(Object.is(roundHalfAway(-0.04, 1), 0)).toBe(true);
    expect(roundHalfAway(NaN, 1)).toBeNaN();
  });
});

import { describe, expect, it } from 'vitest';
import { patternStatistics } from './pattern-statistics';

describe('patternStatistics() (Taylor 2001)', () => {
  it('gives r = 1 and zero centred RMS for a map and the same map shifted, with the shift as RMS difference', () => {
    const a = [1, 2, 3, 4];
    const s = patternStatistics(a, a.map((v) => v + 0.5), [1, 2, 3, 4]);
    expect(s.correlation).toBeCloseTo(1, 14);
    expect(s.centredRmsDifference).toBeCloseTo(0, 7);
    expect(s.rmsDifference).toBeCloseTo(0.5, 14);
  });

  it('weights cells: a heavy cell dominates (hand-computed: means 0.9 and 0.1, r = −1)', () => {
    const s = patternStatistics([1, 0], [0, 1], [9, 1]);
    expect(s.correlation).toBeCloseTo(-1, 14);
    expect(s.rmsDifference).toBeCloseTo(1, 14);
  });

  it('skips missing cells and is null without any common cell or spread', () => {
    expect(patternStatistics([NaN, 1], [1, NaN], [1, 1])).toEqual({ correlation: null, rmsDifference: null, centredRmsDifference: null, cells: 0 });
    expect(patternStatistics([2, 2], [1, 3], [1, 1]).correlation).toBeNull();
  });
});

import { describe, expect, it } from 'vitest';
import { sampleRankCorrelation } from 'simple-statistics';
import { mulberry32 } from './prng';
import { spearman } from './spearman';

describe('spearman()', () => {
  it('agrees with simple-statistics sampleRankCorrelation() (midranks) on tied, seeded data to 1e-13', () => {
    const rng = mulberry32(7);
    // Values rounded to one decimal so that ties occur.
    const x = Array.from({ length: 300 }, () => Math.round(rng() * 20) / 10);
    const y = x.map((v) => Math.round((v + rng()) * 10) / 10);
    expect(Math.abs((spearman(x, y) as number) - sampleRankCorrelation(x, y))).toBeLessThan(1e-13);
  });

  it('is 1 for any strictly increasing relation', () => {
    expect(spearman([1, 2, 3, 4, 5], [1, 8, 27, 64, 1e6])).toBeCloseTo(1, 15);
  });

  it('ranks only pairs where both are present and is null for a constant member', () => {
    expect(spearman([1, 2, null, 4], [3, 2, 9, 1])).toBeCloseTo(-1, 15);
    expect(spearman([2, 2, 2], [1, 2, 3])).toBeNull();
  });
});

import { describe, expect, it } from 'vitest';
import { sampleCorrelation } from 'simple-statistics';
import { fixtureCsv } from '../../test-fixtures/read-fixture';
import { mulberry32, normalVariate } from './prng';
import { pearson } from './pearson';

const anscombe = fixtureCsv('anscombe-1973.csv');
const col = (k: string) => anscombe.map((r) => r[k]);

describe('pearson()', () => {
  it("gives r ≈ 0.816 for all four sets of Anscombe's quartet (Anscombe 1973; tolerance 5e-3)", () => {
    for (const [x, y] of [['x123', 'y1'], ['x123', 'y2'], ['x123', 'y3'], ['x4', 'y4']]) {
      expect(Math.abs((pearson(col(x), col(y)) as number) - 0.816)).toBeLessThan(5e-3);
    }
  });

  it('agrees with simple-statistics sampleCorrelation() on seeded random data to 1e-13', () => {
    const rng = mulberry32(42);
    const x = Array.from({ length: 500 }, () => normalVariate(rng));
    const y = x.map((v) => 0.3 * v + normalVariate(rng));
    expect(Math.abs((pearson(x, y) as number) - sampleCorrelation(x, y))).toBeLessThan(1e-13);
  });

  it('is unchanged by a 1e8 offset (NumAcc-style) and by scaling to 1e300', () => {
    const x = [1, 2, 3, 4, 5.5];
    const y = [2, 1, 4, 3, 6];
    const r = pearson(x, y) as number;
    expect(pearson(x.map((v) => v + 1e8), y.map((v) => v + 1e8))).toBeCloseTo(r, 9);
    expect(pearson(x.map((v) => v * 1e300), y)).toBeCloseTo(r, 14);
  });

  it('is null for a constant member, fewer than three pairs, or empty input', () => {
    expect(pearson([1, 1, 1, 1], [1, 2, 3, 4])).toBeNull();
    expect(pearson([1, 2], [2, 1])).toBeNull();
    expect(pearson([], [])).toBeNull();
  });

  it('uses only pairs where both members are present', () => {
    expect(pearson([1, 2, 3, null, 5], [2, 4, 6, 100, NaN])).toBeCloseTo(1, 15);
  });
});

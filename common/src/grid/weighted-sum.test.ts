import { describe, expect, it } from 'vitest';
import { weightedSum } from './weighted-sum';

describe('weightedSum()', () => {
  const out = new Float64Array(2);

  it('gives Σ w·v and Σ w over a window (worked by hand: 2·1 + 3·2 + 4·3 = 20, weights 9)', () => {
    weightedSum([9, 1, 2, 3, 9], 1, [0, 2, 3, 4, 0], 1, 3, out);
    expect(Array.from(out)).toEqual([20, 9]);
  });

  it('skips NaN and ±Infinity (the engine’s missing-value rule) and lets zero weights add nothing', () => {
    weightedSum([1, Number.NaN, Number.POSITIVE_INFINITY, 5, 7], 0, [1, 1, 1, 0, 2], 0, 5, out);
    expect(Array.from(out)).toEqual([15, 3]);
  });

  it('reads values and weights at separate offsets, odd and even lengths alike', () => {
    weightedSum(Float32Array.of(0, 0, 1, 2, 3), 2, Float64Array.of(1, 1, 1), 0, 3, out);
    expect(Array.from(out)).toEqual([6, 3]);
    weightedSum([4], 0, [0.5], 0, 1, out);
    expect(Array.from(out)).toEqual([2, 0.5]);
  });

  it('gives zeros for an empty window or one with nothing present', () => {
    weightedSum([], 0, [], 0, 0, out);
    expect(Array.from(out)).toEqual([0, 0]);
    weightedSum([Number.NaN, Number.NaN], 0, [1, 1], 0, 2, out);
    expect(Array.from(out)).toEqual([0, 0]);
  });
});

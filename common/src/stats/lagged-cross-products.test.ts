import { describe, expect, it } from 'vitest';
import { laggedCrossProducts } from './lagged-cross-products';
import { mulberry32 } from './prng';

/** Σ x[i]·y[i + k − d] by the definition, one lag at a time. */
function direct(x: Float64Array, y: Float64Array, d: number, k: number): number {
  let s = 0;
  for (let i = 0; i < x.length; i++) {
    const j = i + k - d;
    if (j >= 0 && j < y.length) s += x[i] * y[j];
  }
  return s;
}

describe('laggedCrossProducts()', () => {
  it('equals the one-lag-at-a-time sum for every lag, with different lengths and starts, including lags beyond the overlap', () => {
    const rng = mulberry32(3);
    for (const [nx, ny, d, maxLag] of [[50, 50, 0, 7], [40, 63, 5, 12], [30, 20, -4, 40], [5, 9, 2, 1], [1, 1, 0, 3]]) {
      const x = Float64Array.from({ length: nx }, () => rng() - 0.5);
      const y = Float64Array.from({ length: ny }, () => rng() - 0.5);
      const out = new Float64Array(2 * maxLag + 1);
      laggedCrossProducts(x, y, d, maxLag, out);
      for (let k = -maxLag; k <= maxLag; k++) expect(out[k + maxLag]).toBeCloseTo(direct(x, y, d, k), 13);
    }
  });
});

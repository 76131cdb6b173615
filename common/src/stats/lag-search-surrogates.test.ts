import { describe, expect, it } from 'vitest';
import { sampleCorrelation } from 'simple-statistics';
import { ebisuzakiSurrogate } from './ebisuzaki';
import { lagSearchSurrogates } from './lag-search-surrogates';
import { mulberry32, normalVariate } from './prng';

function ar1(n: number, phi: number, seed: number): Float64Array {
  const rng = mulberry32(seed);
  let a = 0;
  return Float64Array.from({ length: n }, () => (a = phi * a + normalVariate(rng)));
}

/** |r| of the surrogate s with y at each lag by brute force (simple-statistics sampleCorrelation over the window). */
function bruteAbsR(s: Float64Array, y: Float64Array, d: number, maxLag: number): number[] {
  const out: number[] = [];
  for (let k = -maxLag; k <= maxLag; k++) {
    const a: number[] = [];
    const b: number[] = [];
    for (let i = 0; i < s.length; i++) {
      const j = i + k - d;
      if (j >= 0 && j < y.length) {
        a.push(s[i]);
        b.push(y[j]);
      }
    }
    out.push(Math.abs(sampleCorrelation(a, b)));
  }
  return out;
}

describe('lagSearchSurrogates() (Ebisuzaki 1997 surrogates over a lag window)', () => {
  for (const [nx, ny, d] of [[120, 120, 0], [121, 130, 5], [96, 90, -3]]) {
    it(`scans the same surrogate ebisuzakiSurrogate() builds with the same seed, at every lag (nx ${nx}, ny ${ny}, d ${d})`, () => {
      const x = ar1(nx, 0.7, 1);
      const y = ar1(ny, 0.4, 2);
      const maxLag = 6;
      const truth = bruteAbsR(ebisuzakiSurrogate(x, mulberry32(11)), y, d, maxLag);
      const eligible = new Uint8Array(truth.length).fill(1);
      // Observed |r| just above / just below the surrogate's: the count flips exactly there.
      const above = lagSearchSurrogates({ x, y, d, maxLag, observedAbsR: Float64Array.from(truth, (v) => v * (1 + 1e-9)), eligible, rng: mulberry32(11), surrogates: 1 });
      const below = lagSearchSurrogates({ x, y, d, maxLag, observedAbsR: Float64Array.from(truth, (v) => v * (1 - 1e-9)), eligible, rng: mulberry32(11), surrogates: 1 });
      expect(Array.from(above.pLag)).toEqual(truth.map(() => 0));
      expect(Array.from(below.pLag)).toEqual(truth.map(() => 1));
      expect(above.pSearch).toBe(0);
      expect(below.pSearch).toBe(1);
    });
  }

  it('takes the maximum only over the eligible lags', () => {
    const x = ar1(120, 0.7, 3);
    const y = ar1(120, 0.4, 4);
    const truth = bruteAbsR(ebisuzakiSurrogate(x, mulberry32(5)), y, 0, 4);
    const top = truth.indexOf(Math.max(...truth));
    const eligible = new Uint8Array(truth.length).fill(1);
    eligible[top] = 0;
    // Observed max (at an eligible lag) lies between the surrogate's overall max and its max over the eligible lags.
    const second = Math.max(...truth.filter((_, q) => q !== top));
    const observed = new Float64Array(truth.length).fill(0.0);
    observed[(top + 1) % truth.length] = (second + truth[top]) / 2;
    const res = lagSearchSurrogates({ x, y, d: 0, maxLag: 4, observedAbsR: observed, eligible, rng: mulberry32(5), surrogates: 1 });
    expect(res.pSearch).toBe(0);
  });
});

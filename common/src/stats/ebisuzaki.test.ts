import { describe, expect, it } from 'vitest';
import { correlationPValue } from './correlation-p-value';
import { ebisuzakiSurrogate, ebisuzakiSurrogateCorrelations, ebisuzakiTest } from './ebisuzaki';
import { pearson } from './pearson';
import { mulberry32, normalVariate } from './prng';
import { realDft } from './dft';

function ar1(n: number, phi: number, seed: number): number[] {
  const rng = mulberry32(seed);
  let a = 0;
  return Array.from({ length: n }, () => (a = phi * a + normalVariate(rng)));
}

// Ebisuzaki (1997), J. Climate 10:2147–2153: phase-randomised surrogates, p = share with |r_s| ≥ |r|.
describe('ebisuzakiTest() (Ebisuzaki 1997)', () => {
  it('builds surrogates with the amplitude spectrum of x (odd N) and zero mean', () => {
    const x = ar1(101, 0.7, 1);
    const s = ebisuzakiSurrogate(x, mulberry32(3));
    const X = realDft(x);
    const S = realDft(s);
    expect(Math.abs(S.re[0])).toBeLessThan(1e-9);
    for (let k = 1; k <= 50; k++) expect(Math.hypot(S.re[k], S.im[k])).toBeCloseTo(Math.hypot(X.re[k], X.im[k]), 8);
  });

  it('computes each r_s by Parseval exactly as correlating the time-domain surrogate would (same seed; N = 120 and 121)', () => {
    for (const n of [120, 121]) {
      const x = ar1(n, 0.6, 2);
      const y = ar1(n, 0.6, 4);
      const fast = ebisuzakiSurrogateCorrelations(x, y, mulberry32(9), 3);
      const rng = mulberry32(9);
      for (let s = 0; s < 3; s++) expect(fast[s]).toBeCloseTo(pearson(ebisuzakiSurrogate(x, rng), y) as number, 10);
    }
  });

  it('is more cautious than the white-noise t test for independent red-noise series (seeded)', () => {
    const x = ar1(240, 0.9, 5);
    const y = ar1(240, 0.9, 6);
    const res = ebisuzakiTest(x, y, mulberry32(7), 2000);
    const naive = correlationPValue(res.r, 240) as number;
    expect(res.p as number).toBeGreaterThan(naive);
  });

  it('gives p = 0 for a strong real relation and repeats with the same seed', () => {
    const x = ar1(200, 0.5, 8);
    const y = x.map((v, i) => v + 0.2 * Math.sin(i));
    expect(ebisuzakiTest(x, y, mulberry32(1), 500).p).toBe(0);
    const a = ebisuzakiTest(ar1(100, 0.5, 1), ar1(100, 0.5, 2), mulberry32(42), 300);
    const b = ebisuzakiTest(ar1(100, 0.5, 1), ar1(100, 0.5, 2), mulberry32(42), 300);
    expect(a).toEqual(b);
  });

  it('returns null p for series with gaps, unequal lengths, or a constant member', () => {
    expect(ebisuzakiTest([1, 2, null, 4], [1, 2, 3, 4], mulberry32(1)).p).toBeNull();
    expect(ebisuzakiTest([1, 2, 3], [1, 2, 3, 4], mulberry32(1)).p).toBeNull();
    expect(ebisuzakiTest([2, 2, 2, 2], [1, 2, 3, 4], mulberry32(1)).p).toBeNull();
  });
});

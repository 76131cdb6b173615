import { describe, expect, it } from 'vitest';
import { realDft } from './dft';

describe('realDft()', () => {
  it('puts a pure cosine of k cycles into bin k with amplitude N/2, and the mean into bin 0', () => {
    const n = 24;
    const x = Array.from({ length: n }, (_, t) => 3 + 2 * Math.cos((2 * Math.PI * 5 * t) / n));
    const X = realDft(x);
    expect(X.re[0]).toBeCloseTo(3 * n, 10);
    expect(X.re[5]).toBeCloseTo(n, 10);
    for (let k = 1; k <= 12; k++) if (k !== 5) expect(Math.hypot(X.re[k], X.im[k])).toBeLessThan(1e-10);
  });

  it('satisfies Parseval: Σx² = (1/N)(|X0|² + 2Σ|Xk|² + |X_N/2|²) for odd and even N', () => {
    for (const n of [11, 12]) {
      const x = Array.from({ length: n }, (_, t) => Math.sin(t * 1.7) + t / 10);
      const X = realDft(x);
      const half = Math.floor(n / 2);
      let e = X.re[0] ** 2;
      for (let k = 1; k <= half; k++) e += (n % 2 === 0 && k === half ? 1 : 2) * (X.re[k] ** 2 + X.im[k] ** 2);
      expect(e / n).toBeCloseTo(x.reduce((s, v) => s + v * v, 0), 10);
    }
  });
});

import { describe, expect, it } from 'vitest';
import { fftPlan } from './fft';
import { mulberry32 } from './prng';

/** The DFT by its definition X_k = Σ_t x_t·e^(∓2πi·kt/n), summed directly (the textbook O(n²) form). */
function directDft(re: number[], im: number[], inverse: boolean): [number[], number[]] {
  const n = re.length;
  const s = inverse ? 1 : -1;
  const outRe: number[] = [];
  const outIm: number[] = [];
  for (let k = 0; k < n; k++) {
    let a = 0;
    let b = 0;
    for (let t = 0; t < n; t++) {
      const w = (s * 2 * Math.PI * ((k * t) % n)) / n;
      a += re[t] * Math.cos(w) - im[t] * Math.sin(w);
      b += re[t] * Math.sin(w) + im[t] * Math.cos(w);
    }
    outRe.push(a);
    outIm.push(b);
  }
  return [outRe, outIm];
}

describe('fftPlan()', () => {
  it('matches the DFT definition summed directly, forward and inverse: power-of-two, mixed-radix (12, 120, 121 = 11², 600, 1001 = 7·11·13) and Bluestein (17, 127) lengths', () => {
    const rng = mulberry32(5);
    for (const n of [1, 2, 3, 8, 12, 17, 120, 121, 127, 256, 600, 1001]) {
      const re = Array.from({ length: n }, () => rng() - 0.5);
      const im = Array.from({ length: n }, () => rng() - 0.5);
      const plan = fftPlan(n);
      for (const inverse of [false, true]) {
        const [er, ei] = directDft(re, im, inverse);
        const r = Float64Array.from(re);
        const i = Float64Array.from(im);
        plan.transform(r, i, inverse);
        for (let k = 0; k < n; k++) {
          expect(Math.abs(r[k] - er[k])).toBeLessThan(1e-10 * n);
          expect(Math.abs(i[k] - ei[k])).toBeLessThan(1e-10 * n);
        }
      }
    }
  });

  it('inverts: the inverse transform of the forward transform is n·x', () => {
    const plan = fftPlan(600);
    const x = Float64Array.from({ length: 600 }, (_, t) => Math.sin(t) + t / 600);
    const re = Float64Array.from(x);
    const im = new Float64Array(600);
    plan.transform(re, im, false);
    plan.transform(re, im, true);
    for (let t = 0; t < 600; t++) expect(re[t] / 600).toBeCloseTo(x[t], 11);
  });
});

import { describe, expect, it } from 'vitest';
import { createRandomStream, DEMO_SEED } from './random-stream';

const draw = (seed: number, n: number, f: 'uniform' | 'gaussian') => {
  const r = createRandomStream(seed);
  return Array.from({ length: n }, () => r[f]());
};

describe('createRandomStream()', () => {
  it('gives the same draws for the same seed and different ones for another seed', () => {
    expect(draw(DEMO_SEED, 50, 'gaussian')).toEqual(draw(DEMO_SEED, 50, 'gaussian'));
    expect(draw(DEMO_SEED, 50, 'uniform')).not.toEqual(draw(DEMO_SEED + 1, 50, 'uniform'));
  });

  it('draws uniforms in [0, 1) with mean 1/2 and variance 1/12 (uniform distribution, common practice; 200 000 draws, ±5 standard errors)', () => {
    const u = draw(DEMO_SEED, 200_000, 'uniform');
    expect(u.every((x) => x >= 0 && x < 1)).toBe(true);
    const m = u.reduce((a, b) => a + b, 0) / u.length;
    const v = u.reduce((a, b) => a + (b - m) ** 2, 0) / u.length;
    expect(Math.abs(m - 0.5)).toBeLessThan(5 * Math.sqrt(1 / 12 / u.length));
    expect(Math.abs(v - 1 / 12)).toBeLessThan(0.001);
  });

  it('draws standard normals by Box–Muller: mean 0, variance 1, 95.45 % within ±2 and 68.27 % within ±1 (normal table, from memory)', () => {
    const z = draw(DEMO_SEED, 200_000, 'gaussian');
    const n = z.length;
    const m = z.reduce((a, b) => a + b, 0) / n;
    const v = z.reduce((a, b) => a + (b - m) ** 2, 0) / n;
    expect(Math.abs(m)).toBeLessThan(5 / Math.sqrt(n));
    expect(Math.abs(v - 1)).toBeLessThan(5 * Math.sqrt(2 / n));
    const within = (k: number) => z.filter((x) => Math.abs(x) <= k).length / n;
    expect(within(1)).toBeCloseTo(0.6827, 2);
    expect(within(2)).toBeCloseTo(0.9545, 2);
    expect(z.every(Number.isFinite)).toBe(true);
  });

  it('refuses a seed that is not a non-negative 32-bit integer', () => {
    for (const bad of [1.5, -1, 2 ** 31, Number.NaN]) expect(() => createRandomStream(bad)).toThrow(/seed must be an integer from 0 to 2147483647/);
    expect(() => createRandomStream(2 ** 31 - 1)).not.toThrow();
  });
});

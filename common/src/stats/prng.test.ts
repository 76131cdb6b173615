import { describe, expect, it } from 'vitest';
import { mulberry32, normalVariate } from './prng';

describe('mulberry32()', () => {
  it('repeats its sequence for the same seed and differs for another seed', () => {
    const a = mulberry32(123);
    const b = mulberry32(123);
    const c = mulberry32(124);
    const sa = Array.from({ length: 5 }, a);
    expect(Array.from({ length: 5 }, b)).toEqual(sa);
    expect(Array.from({ length: 5 }, c)).not.toEqual(sa);
  });

  it('draws in [0, 1) and spreads evenly over ten bins (chi-square < 27.9, the 0.1% point for 9 dof)', () => {
    const rng = mulberry32(2024);
    const bins = new Array(10).fill(0);
    const n = 100000;
    for (let i = 0; i < n; i++) {
      const u = rng();
      expect(u >= 0 && u < 1).toBe(true);
      bins[Math.floor(u * 10)]++;
    }
    const chi2 = bins.reduce((s, o) => s + (o - n / 10) ** 2 / (n / 10), 0);
    expect(chi2).toBeLessThan(27.9);
  });
});

describe('normalVariate()', () => {
  it('has mean ≈ 0 and sd ≈ 1 over 1e5 draws (tolerance 0.01)', () => {
    const rng = mulberry32(9);
    let s = 0;
    let s2 = 0;
    const n = 100000;
    for (let i = 0; i < n; i++) {
      const z = normalVariate(rng);
      s += z;
      s2 += z * z;
    }
    expect(Math.abs(s / n)).toBeLessThan(0.01);
    expect(Math.abs(Math.sqrt(s2 / n) - 1)).toBeLessThan(0.01);
  });
});

import { describe, expect, it } from 'vitest';
import { linearRegression } from 'simple-statistics';
import { fixtureCsv } from '../../test-fixtures/read-fixture';
import { ols } from './ols';

const norris = fixtureCsv('nist-norris.csv');
const anscombe = fixtureCsv('anscombe-1973.csv');

describe('ols()', () => {
  it('reproduces the NIST StRD certified Norris regression (relative 1e-12 estimates, 1e-10 SEs and R²)', () => {
    const fit = ols(norris.map((r) => r.x), norris.map((r) => r.y));
    const rel = (a: number | null, b: number) => Math.abs((a as number) - b) / Math.abs(b);
    expect(fit.n).toBe(36);
    expect(rel(fit.intercept, -0.262323073774029)).toBeLessThan(1e-12);
    expect(rel(fit.slope, 1.00211681802045)).toBeLessThan(1e-12);
    expect(rel(fit.interceptStdErr, 0.232818234301152)).toBeLessThan(1e-10);
    expect(rel(fit.slopeStdErr, 4.29796848199937e-4)).toBeLessThan(1e-10);
    expect(rel(fit.r2, 0.999993745883712)).toBeLessThan(1e-12);
  });

  it("fits y = 3.00 + 0.500x to every set of Anscombe's quartet (Anscombe 1973; tolerance 5e-3)", () => {
    for (const [x, y] of [['x123', 'y1'], ['x123', 'y2'], ['x123', 'y3'], ['x4', 'y4']]) {
      const fit = ols(anscombe.map((r) => r[x]), anscombe.map((r) => r[y]));
      expect(Math.abs((fit.intercept as number) - 3)).toBeLessThan(5e-3);
      expect(Math.abs((fit.slope as number) - 0.5)).toBeLessThan(5e-3);
    }
  });

  it('agrees with simple-statistics linearRegression() on Norris to 1e-12', () => {
    const ref = linearRegression(norris.map((r) => [r.x, r.y]));
    const fit = ols(norris.map((r) => r.x), norris.map((r) => r.y));
    expect(fit.slope).toBeCloseTo(ref.m, 12);
    expect(fit.intercept).toBeCloseTo(ref.b, 12);
  });

  it('survives a 1e8 offset in x and y (slope unchanged to 1e-8)', () => {
    const fit = ols(norris.map((r) => r.x + 1e8), norris.map((r) => r.y + 1e8));
    expect(Math.abs((fit.slope as number) - 1.00211681802045)).toBeLessThan(1e-8);
  });

  it('scales with y near 1e300 without overflow', () => {
    const fit = ols([0, 1, 2, 3], [1e300, 3e300, 5e300, 7.2e300]);
    expect((fit.slope as number) / 2.06e300).toBeCloseTo(1, 12);
  });

  it('returns nulls for fewer than two pairs or constant x, null SEs for two pairs, null R² for constant y', () => {
    expect(ols([], []).slope).toBeNull();
    expect(ols([1], [2]).slope).toBeNull();
    expect(ols([2, 2, 2], [1, 2, 3]).slope).toBeNull();
    const two = ols([0, 1], [1, 3]);
    expect(two.slope).toBe(2);
    expect(two.slopeStdErr).toBeNull();
    expect(ols([0, 1, 2], [4, 4, 4]).r2).toBeNull();
  });
});

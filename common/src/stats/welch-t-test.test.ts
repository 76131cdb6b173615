import { describe, expect, it } from 'vitest';
import { mapsReference } from '../../test-fixtures/maps-reference';
import { welford } from './welford';
import { welchTTest } from './welch-t-test';

// Reference: scipy.stats.ttest_ind(a, b, equal_var=False), stored by common/test-fixtures/scripts/maps_reference.py.
const { welch } = mapsReference();

describe('welchTTest() (Welch 1947)', () => {
  it('matches scipy.stats.ttest_ind(equal_var=False) on two small samples (t and p to 1e-12)', () => {
    const a = welford(welch.a);
    const b = welford(welch.b);
    const r = welchTTest(a.n, a.mean, a.m2, b.n, b.mean, b.m2);
    expect(r.t!).toBeCloseTo(welch.t, 12);
    expect(r.p!).toBeCloseTo(welch.p, 12);
  });

  it('is antisymmetric in the samples', () => {
    const r = welchTTest(5, 1, 4, 7, 0, 6);
    const s = welchTTest(7, 0, 6, 5, 1, 4);
    expect(s.t).toBeCloseTo(-r.t!, 14);
    expect(s.p).toBeCloseTo(r.p!, 14);
  });

  it('is null with fewer than two values in a sample or no spread at all', () => {
    expect(welchTTest(1, 0, 0, 5, 1, 2)).toEqual({ t: null, dof: null, p: null });
    expect(welchTTest(3, 1, 0, 3, 1, 0)).toEqual({ t: null, dof: null, p: null });
  });
});

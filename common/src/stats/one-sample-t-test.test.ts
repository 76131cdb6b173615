import { describe, expect, it } from 'vitest';
import { mapsReference } from '../../test-fixtures/maps-reference';
import { oneSampleTTest } from './one-sample-t-test';
import { welford } from './welford';

// Reference: scipy.stats.ttest_1samp(a, 20.0), stored by common/test-fixtures/scripts/maps_reference.py.
const { welch } = mapsReference();

describe('oneSampleTTest()', () => {
  it('matches scipy.stats.ttest_1samp (t and p to 1e-12)', () => {
    const m = welford(welch.a.map((v) => v - welch.oneSampleMu));
    const r = oneSampleTTest(m.n, m.mean, m.m2);
    expect(r.t!).toBeCloseTo(welch.oneSampleT, 12);
    expect(r.p!).toBeCloseTo(welch.oneSampleP, 12);
    expect(r.dof).toBe(welch.a.length - 1);
  });

  it('is null for one value or a constant sample', () => {
    expect(oneSampleTTest(1, 2, 0).p).toBeNull();
    expect(oneSampleTTest(4, 2, 0).p).toBeNull();
  });
});

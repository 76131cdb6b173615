import { describe, expect, it } from 'vitest';
import { mapsReference } from '../../test-fixtures/maps-reference';
import { benjaminiHochberg } from './benjamini-hochberg';

// Reference: statsmodels.stats.multitest.multipletests(p, alpha=0.10, method="fdr_bh") on the present p-values,
// stored by common/test-fixtures/scripts/maps_reference.py (fdrDemo: ties, a missing value, a step-up rejection).
const { fdrDemo } = mapsReference();
const p = fdrDemo.p.map((v) => (v === null ? NaN : v));

describe('benjaminiHochberg() (Benjamini & Hochberg 1995)', () => {
  it('rejects the same tests as statsmodels fdr_bh and gives its adjusted p-values (1e-15)', () => {
    const r = benjaminiHochberg(p, 2 * fdrDemo.alpha);
    expect(Array.from(r.significant, (v) => v === 1)).toEqual(fdrDemo.significant);
    expect(r.tested).toBe(fdrDemo.tested);
    fdrDemo.adjusted.forEach((a, i) => (a === null ? expect(r.adjusted[i]).toBeNaN() : expect(r.adjusted[i]).toBeCloseTo(a, 15)));
  });

  it('rejects nothing when no p passes, and everything when all are tiny', () => {
    expect(benjaminiHochberg([0.5, 0.7, 0.9], 0.1).significant).toEqual(new Uint8Array(3));
    expect(Array.from(benjaminiHochberg([1e-9, 2e-9], 0.05).significant)).toEqual([1, 1]);
  });

  it('handles empty input', () => {
    expect(benjaminiHochberg([], 0.1)).toMatchObject({ tested: 0, threshold: 0 });
  });
});

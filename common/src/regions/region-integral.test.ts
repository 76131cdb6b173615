import { describe, expect, it } from 'vitest';
import { gridsReference, withNaN } from '../../test-fixtures/grids-reference';
import { regionIntegral } from './region-integral';

const ref = gridsReference();

describe('regionIntegral()', () => {
  it('sums the analytic cell areas of the rotated-pole grid to the band it covers, 4πR²·sin 60° (Snyder 1987)', () => {
    const all = regionIntegral(new Float64Array(ref.grid.area.length).fill(1), ref.grid.area);
    expect(Math.abs(all!.integral / ref.band_area_m2 - 1)).toBeLessThan(1e-13);
    expect(all!.cells).toBe(ref.ny * ref.nx);
  });

  it('matches xarray weighted(areacello).sum() and .mean() per region of the curvilinear fixture (scripts/grids_reference.py)', () => {
    const values = withNaN(ref.grid.fgco2_t0);
    for (const [name, r] of Object.entries(ref.regions)) {
      const mask = ref.grid.codes.map((c) => c === r.code);
      const got = regionIntegral(values, ref.grid.area, mask);
      expect(got, name).not.toBeNull();
      expect(Math.abs(got!.integral / r.fgco2_integral_mol_s[0] - 1), name).toBeLessThan(1e-12);
      expect(Math.abs(got!.mean / r.fgco2_mean_mol_m2_s[0] - 1), name).toBeLessThan(1e-12);
      expect(Math.abs(got!.area / r.area_m2 - 1), name).toBeLessThan(1e-12); // land cells carry no value but are masked out by code 0
    }
  });

  it('skips missing values, zero areas and masked cells, and is null when nothing counts', () => {
    expect(regionIntegral([1, Number.NaN, 3, 4], [1, 1, 0, 2])).toEqual({ integral: 9, area: 3, mean: 3, cells: 2 });
    expect(regionIntegral([1, 2], [1, 1], [0, 0])).toBeNull();
    expect(regionIntegral([], [])).toBeNull();
  });

  it('keeps a mixed-sign sum of huge values exact where plain summation loses it (compensated, Neumaier 1974)', () => {
    const got = regionIntegral([1e16, 1, -1e16, 1], [1, 1, 1, 1]);
    expect(got!.integral).toBe(2);
  });

  it('refuses arrays that do not describe one grid', () => {
    expect(() => regionIntegral([1, 2], [1])).toThrow(/do not describe one grid/);
    expect(() => regionIntegral([1, 2], [1, 1], [1])).toThrow(/mask/);
  });
});

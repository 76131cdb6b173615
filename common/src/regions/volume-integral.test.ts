import { describe, expect, it } from 'vitest';
import { gridsReference, withNaN } from '../../test-fixtures/grids-reference';
import { thicknessWithinDepth } from './thickness-within-depth';
import { volumeIntegral } from './volume-integral';

const ref = gridsReference();

describe('volumeIntegral()', () => {
  it('integrates DIC over full depth and 0–100 m per region as xarray weighted(volume).sum() does (scripts/grids_reference.py)', () => {
    const n = ref.ny * ref.nx;
    const dic = withNaN(ref.grid.dissic_t0);
    const top100 = thicknessWithinDepth(ref.grid.thkcello, n, 100);
    for (const [name, r] of Object.entries(ref.regions)) {
      const mask = ref.grid.codes.map((c) => c === r.code);
      const full = volumeIntegral(dic, ref.grid.area, ref.grid.thkcello, mask)!;
      expect(Math.abs(full.integral / r.inventory_full_mol[0] - 1), name).toBeLessThan(1e-12);
      expect(Math.abs(full.volume / r.volume_full_m3 - 1), name).toBeLessThan(1e-12);
      const upper = volumeIntegral(dic, ref.grid.area, top100, mask)!;
      expect(Math.abs(upper.integral / r.inventory_0_100m_mol[0] - 1), name).toBeLessThan(1e-12);
      expect(Math.abs(upper.volume / r.volume_0_100m_m3 - 1), name).toBeLessThan(1e-12);
    }
  });

  it('weights by area × thickness: a hand-computed two-level, two-column case', () => {
    // columns of 2 m² and 3 m²; layers 10 m and 5 m (the second column's lower cell is dry)
    const got = volumeIntegral([1, 2, 4, Number.NaN], [2, 3], [10, 10, 5, 0])!;
    expect(got.integral).toBe(1 * 20 + 2 * 30 + 4 * 10);
    expect(got.volume).toBe(60);
    expect(got.cells).toBe(3);
  });

  it('is null for an empty region and refuses a thickness array of another shape', () => {
    expect(volumeIntegral([1, 2], [1, 1], [1, 1], [0, 0])).toBeNull();
    expect(() => volumeIntegral([1, 2, 3], [1, 1], [1, 1, 1])).toThrow(/levels × 2 cells/);
  });
});

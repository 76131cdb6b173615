import { describe, expect, it } from 'vitest';
import { gridsReference, withNaN } from '../../test-fixtures/grids-reference';
import { boxMask } from './box-mask';
import { regionIntegral } from './region-integral';
import { STANDARD_BOXES } from './standard-boxes';

const ref = gridsReference();
const box = (id: string) => STANDARD_BOXES.find((b) => b.id === id)!;

describe('boxMask()', () => {
  it('selects the Niño boxes on the curvilinear fixture as the numpy selection does, and integrates like xarray (scripts/grids_reference.py)', () => {
    const fgco2 = withNaN(ref.grid.fgco2_t0);
    for (const [id, r] of Object.entries(ref.boxes)) {
      const mask = boxMask(ref.grid.lat, ref.grid.lon, box(id));
      expect(mask.reduce((s, m) => s + m, 0), id).toBe(r.cells);
      const got = regionIntegral(fgco2, ref.grid.area, mask);
      expect(Math.abs(got!.integral / r.fgco2_integral_mol_s[0] - 1), id).toBeLessThan(1e-12);
    }
  });

  it('takes Niño 4 across the antimeridian in either longitude convention', () => {
    const lat = [0, 0, 0, 0, 0, 0];
    const lon = [165, 190, -170, 200, -140, 150];
    expect(Array.from(boxMask(lat, lon, box('nino4')))).toEqual([1, 1, 1, 1, 0, 0]);
  });

  it('is half-open in longitude so neighbouring boxes never share a cell (Niño 4 and Niño 3 meet at 150°W)', () => {
    const lat = [0, 0];
    const lon = [-150, 210];
    expect(Array.from(boxMask(lat, lon, box('nino3')))).toEqual([1, 1]);
    expect(Array.from(boxMask(lat, lon, box('nino4')))).toEqual([0, 0]);
  });

  it('includes both latitude edges and treats NaN centres as outside', () => {
    expect(Array.from(boxMask([-5, 5, 5.01, Number.NaN], [-160, -160, -160, -160], box('nino34')))).toEqual([1, 1, 0, 0]);
  });
});

import { describe, expect, it } from 'vitest';
import { anomalySlice } from './anomaly-slice';

describe('anomalySlice()', () => {
  it('subtracts the climatology of the slice’s calendar month per cell', () => {
    const clim = new Float64Array(24);
    clim[2 * 2] = 10; // March, cell 0
    clim[2 * 2 + 1] = 20; // March, cell 1
    const out = anomalySlice([11, 19], clim, 2000 * 12 + 2, new Float64Array(2));
    expect(Array.from(out)).toEqual([1, -1]);
  });

  it('gives NaN where the value, the climatology or the mask says missing', () => {
    const clim = new Float64Array(36).fill(1);
    clim[1] = NaN;
    const out = anomalySlice([NaN, 2, 3], clim, 0, new Float64Array(3), Uint8Array.of(0, 0, 1));
    expect(Array.from(out).map(Number.isNaN)).toEqual([true, true, true]);
  });
});

import { describe, expect, it } from 'vitest';
import { thicknessWithinDepth } from './thickness-within-depth';

describe('thicknessWithinDepth()', () => {
  it('clips the layer holding H and drops those below (hand-computed: layers 10, 40, 100 m, H = 100 → 10, 40, 50)', () => {
    expect(Array.from(thicknessWithinDepth([10, 40, 100], 1, 100))).toEqual([10, 40, 50]);
  });

  it('follows partial bottom cells column by column: a 30 m deep column keeps its shaved 20 m cell whole under H = 100', () => {
    // two columns, levels 10 / 40 / 100 m; column 2 has its floor at 30 m (partial cell of 20 m, dry below)
    const thk = [10, 10, 40, 20, 100, 0];
    expect(Array.from(thicknessWithinDepth(thk, 2, 100))).toEqual([10, 10, 40, 20, 50, 0]);
    // hand-computed volumes with areas 2 and 3 m²: (10+40+50)·2 + (10+20)·3 = 290 m³
    const clipped = thicknessWithinDepth(thk, 2, 100);
    expect(2 * (clipped[0] + clipped[2] + clipped[4]) + 3 * (clipped[1] + clipped[3] + clipped[5])).toBe(290);
  });

  it('keeps every wet cell for full depth, counts NaN (land) as dry, and clips inside the top layer', () => {
    expect(Array.from(thicknessWithinDepth([10, Number.NaN, 40, 5], 2, Infinity))).toEqual([10, 0, 40, 5]);
    expect(Array.from(thicknessWithinDepth([10, 40], 1, 2.5))).toEqual([2.5, 0]);
    expect(Array.from(thicknessWithinDepth([10, 40], 1, 0))).toEqual([0, 0]);
  });

  it('refuses a negative limit and a shape that is not levels × cells', () => {
    expect(() => thicknessWithinDepth([1, 2, 3], 2, 10)).toThrow(/levels × 2 cells/);
    expect(() => thicknessWithinDepth([1, 2], 1, -5)).toThrow(/≥ 0 m/);
  });
});

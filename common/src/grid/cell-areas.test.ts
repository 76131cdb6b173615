import { describe, expect, it } from 'vitest';
import { cellAreas } from './cell-areas';
import { EARTH_RADIUS_6371_KM_M, EARTH_RADIUS_GRS80_MEAN_M } from './earth-radius';

const range = (from: number, to: number, step: number) => Array.from({ length: Math.round((to - from) / step) + 1 }, (_, i) => from + i * step);

// Check values for R = 6371 km from common/test-fixtures/check-values.json (spherical cell area A = R²·Δλ·(sin φ2 − sin φ1)).
describe('cellAreas()', () => {
  const areas = cellAreas(range(-90, 90, 1), range(0, 360, 1), EARTH_RADIUS_6371_KM_M);

  it('sums all 1°×1° cells to 4πR² = 510,064,471.91 km² (R = 6371 km)', () => {
    const total = areas.reduce((a, b) => a + b, 0) / 1e6;
    expect(total).toBeCloseTo(4 * Math.PI * 6371 ** 2, 3);
    expect(total).toBeCloseTo(510064471.91, 1);
  });

  it('gives 12,363.684 km² for the 0–1°N cell and 107.896 km² for the 89–90°N cell', () => {
    expect(areas[90 * 360] / 1e6).toBeCloseTo(12363.684, 3);
    expect(areas[179 * 360] / 1e6).toBeCloseTo(107.896, 3);
  });

  it('gives the band 5°S–5°N the fraction sin 5° = 0.0871557 of the sphere', () => {
    const band = cellAreas([-5, 5], [0, 360]);
    expect(band[0] / (4 * Math.PI * EARTH_RADIUS_GRS80_MEAN_M ** 2)).toBeCloseTo(Math.sin((5 * Math.PI) / 180), 14);
    expect(Math.sin((5 * Math.PI) / 180)).toBeCloseTo(0.0871557, 7);
  });

  it('defaults to the GRS80 mean radius R1 = 6,371,008.7714 m and accepts descending edges', () => {
    expect(cellAreas([0, 1], [0, 1])[0]).toBeCloseTo(cellAreas([1, 0], [1, 0], EARTH_RADIUS_GRS80_MEAN_M)[0], 6);
    expect(cellAreas([0, 1], [0, 1])[0] / cellAreas([0, 1], [0, 1], 6371000)[0]).toBeCloseTo((6371008.7714 / 6371000) ** 2, 14);
  });

  it('rejects a grid without cells', () => {
    expect(() => cellAreas([0], [0, 1])).toThrow(RangeError);
  });
});

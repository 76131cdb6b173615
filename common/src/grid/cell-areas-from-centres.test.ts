import { describe, expect, it } from 'vitest';
import { cellAreas } from './cell-areas';
import { cellAreasFromCentres } from './cell-areas-from-centres';
import { EARTH_RADIUS_6371_KM_M } from './earth-radius';

describe('cellAreasFromCentres()', () => {
  it('equals cellAreas() on the edges of a regular 1° grid (centres −89.5..89.5, 0.5..359.5) and sums to 4πR²', () => {
    const lat = Array.from({ length: 180 }, (_, i) => -89.5 + i);
    const lon = Array.from({ length: 360 }, (_, j) => 0.5 + j);
    const fromCentres = cellAreasFromCentres(lat, lon, EARTH_RADIUS_6371_KM_M);
    const fromEdges = cellAreas(Array.from({ length: 181 }, (_, i) => -90 + i), Array.from({ length: 361 }, (_, j) => j), EARTH_RADIUS_6371_KM_M);
    for (const k of [0, 12345, 64799]) expect(fromCentres[k]).toBeCloseTo(fromEdges[k], 3);
    expect(fromCentres.reduce((a, b) => a + b, 0) / 1e6).toBeCloseTo(510064471.91, 1);
  });
});

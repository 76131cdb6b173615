import { describe, expect, it } from 'vitest';
import { areaIntegral, areaWeightedMean } from './area-mean';
import { cellAreas } from './cell-areas';

const latEdges = Array.from({ length: 19 }, (_, i) => -90 + 10 * i);
const lonEdges = Array.from({ length: 37 }, (_, i) => 10 * i);
const areas = cellAreas(latEdges, lonEdges, 1);

describe('areaWeightedMean() / areaIntegral()', () => {
  it('gives a constant field its constant, and the integral of 1 over the unit sphere 4π', () => {
    expect(areaWeightedMean(new Float64Array(areas.length).fill(2.5), areas)).toBeCloseTo(2.5, 14);
    expect(areaIntegral(new Float64Array(areas.length).fill(1), areas)).toBeCloseTo(4 * Math.PI, 12);
  });

  it('averages sin(latitude) exactly over the cells: the cell mean of sin φ is Σ(sin² edges)/2 per band — zero over the globe', () => {
    const field = new Float64Array(areas.length);
    for (let i = 0; i < 18; i++) for (let j = 0; j < 36; j++) field[i * 36 + j] = Math.sin(((latEdges[i] + 5) * Math.PI) / 180);
    expect(Math.abs(areaWeightedMean(field, areas) as number)).toBeLessThan(1e-15);
  });

  it('weights by area: the mean of "1 north of the equator, 0 south" is 0.5; a mask keeps only the tropics', () => {
    const field = new Float64Array(areas.length);
    for (let k = 0; k < areas.length; k++) field[k] = Math.floor(k / 36) >= 9 ? 1 : 0;
    expect(areaWeightedMean(field, areas)).toBeCloseTo(0.5, 14);
    const mask = Array.from(areas, (_, k) => Math.floor(k / 36) === 8 || Math.floor(k / 36) === 9);
    expect(areaWeightedMean(field, areas, mask)).toBeCloseTo(0.5, 14);
    // 0–10°N only: the integral of 1 is 2π·sin 10° on the unit sphere.
    expect(areaIntegral(field, areas, mask)).toBeCloseTo(2 * Math.PI * Math.sin(Math.PI / 18), 12);
  });

  it('skips NaN cells and is null when nothing is left', () => {
    const field = new Float64Array(areas.length).fill(NaN);
    field[0] = 3;
    expect(areaWeightedMean(field, areas)).toBeCloseTo(3, 14);
    expect(areaWeightedMean(new Float64Array(areas.length).fill(NaN), areas)).toBeNull();
    expect(areaIntegral(new Float64Array(areas.length).fill(NaN), areas)).toBeNull();
  });
});

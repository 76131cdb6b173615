import { describe, expect, it } from 'vitest';
import { polygonMask } from './polygon-mask';

describe('polygonMask()', () => {
  it('marks cell centres inside a Polygon or any part of a MultiPolygon', () => {
    const lat = [0, 0, 0, 50, Number.NaN];
    const lon = [10, 175, -175, 10, 10];
    const square = [[0, -5], [20, -5], [20, 5], [0, 5], [0, -5]];
    const dateline = [[170, -5], [-170, -5], [-170, 5], [170, 5], [170, -5]];
    expect(Array.from(polygonMask(lat, lon, { type: 'Polygon', coordinates: [square] }))).toEqual([1, 0, 0, 0, 0]);
    expect(Array.from(polygonMask(lat, lon, { type: 'MultiPolygon', coordinates: [[square], [dateline]] }))).toEqual([1, 1, 1, 0, 0]);
  });

  it('refuses centres of two lengths', () => {
    expect(() => polygonMask([0], [0, 1], { type: 'Polygon', coordinates: [] })).toThrow(/1 latitudes and 2 longitudes/);
  });
});

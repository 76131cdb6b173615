import booleanPointInPolygon from '@turf/boolean-point-in-polygon';
import { describe, expect, it } from 'vitest';
import { mulberry32 } from '../stats/prng';
import { pointInPolygon } from './point-in-polygon';

// A concave polygon with a hole, away from the antimeridian.
const outer = [[-160, -30], [-100, -35], [-90, 10], [-120, 0], [-130, 40], [-170, 20], [-160, -30]];
const hole = [[-150, -10], [-130, -10], [-130, 5], [-150, 5], [-150, -10]];

describe('pointInPolygon()', () => {
  it('agrees with @turf/boolean-point-in-polygon 7.4.0 on 2000 seeded random points (concave ring with a hole)', () => {
    const rand = mulberry32(16);
    let inside = 0;
    for (let i = 0; i < 2000; i++) {
      const lon = -180 + 100 * rand();
      const lat = -40 + 90 * rand();
      const expected = booleanPointInPolygon([lon, lat], { type: 'Polygon', coordinates: [outer, hole] });
      expect(pointInPolygon(lon, lat, [outer, hole]), `${lon}, ${lat}`).toBe(expected);
      if (expected) inside++;
    }
    expect(inside).toBeGreaterThan(200); // the sample hits the polygon, not only its outside
  });

  it('handles a ring across the antimeridian written as 170°E → −170°E: same answers as turf on the ring shifted to 0–360', () => {
    const crossing = [[170, -10], [-170, -10], [-170, 10], [170, 10], [170, -10]];
    const shifted = { type: 'Polygon' as const, coordinates: [crossing.map(([x, y]) => [x < 0 ? x + 360 : x, y])] };
    const rand = mulberry32(7);
    for (let i = 0; i < 1000; i++) {
      const lon = -180 + 360 * rand();
      const lat = -20 + 40 * rand();
      const expected = booleanPointInPolygon([lon < 0 ? lon + 360 : lon, lat], shifted);
      expect(pointInPolygon(lon, lat, [crossing]), `${lon}, ${lat}`).toBe(expected);
    }
    expect(pointInPolygon(179.5, 0, [crossing])).toBe(true);
    expect(pointInPolygon(-179.5, 0, [crossing])).toBe(true);
    expect(pointInPolygon(180.5, 0, [crossing])).toBe(true); // a 0–360 point
    expect(pointInPolygon(0, 0, [crossing])).toBe(false);
  });

  it('takes rings written in 0–360 for points in −180–180 and the reverse', () => {
    const eastPacific = [[200, -5], [240, -5], [240, 5], [200, 5]];
    expect(pointInPolygon(-150, 0, [eastPacific])).toBe(true);
    expect(pointInPolygon(150, 0, [eastPacific])).toBe(false);
  });

  it('is false for no rings', () => {
    expect(pointInPolygon(0, 0, [])).toBe(false);
  });
});

import { EARTH_RADIUS_6371_KM_M } from '@upwell/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fixture } from '../../../test/fixtures/netcdf/fixture-path';
import { openNetcdf } from './open-netcdf';
import { reduceBox } from './reduce-box';
import type { NetcdfFile } from './types';

const DEG = Math.PI / 180;
// The fixture's fictional planet radius for areacello (make-fixtures.py).
const R_FILE = 6.0e6;

/**
 * Exact area-weighted (cos φ) mean of sin φ over the band [φ1, φ2]:
 * ∫ sin φ cos φ dφ / ∫ cos φ dφ = (sin²φ2 − sin²φ1) / (2 (sin φ2 − sin φ1)) = (sin φ1 + sin φ2) / 2.
 * The fixture stores sin at cell centres φc, cells of half-width h: a cell's weight is
 * sin(φc+h) − sin(φc−h) = 2 cos φc sin h and its exact integral of sin is sin h cos h sin 2φc,
 * i.e. weight × sin φc × cos h. So over cells aligned with the band the discrete mean is
 * exactly (exact mean) / cos h — a sharp check, not a loose one.
 */
function bandMeanOfCentreSines(lat1: number, lat2: number, halfWidth: number): number {
  return (Math.sin(lat1 * DEG) + Math.sin(lat2 * DEG)) / 2 / Math.cos(halfWidth * DEG);
}

let sinlat: NetcdfFile;
let descending: NetcdfFile;
let depth: NetcdfFile;
beforeAll(async () => {
  sinlat = await openNetcdf(fixture('field-sinlat.nc'));
  descending = await openNetcdf(fixture('field-descending.nc'));
  depth = await openNetcdf(fixture('field-depth.nc'));
});
afterAll(() => {
  sinlat.close();
  descending.close();
  depth.close();
});

describe('reduceBox() area-weighted mean', () => {
  it('of sin(lat) over 10°N–30°N equals (sin 10° + sin 30°)/2 / cos 0.5° (analytic, see bandMeanOfCentreSines)', () => {
    const r = reduceBox(sinlat, 'sinlat', { box: { lat: [10, 30], lon: [0, 360] } });
    const expected = bandMeanOfCentreSines(10, 30, 0.5);
    expect(r.start).toBe('2000-01');
    // Values stored as float32: relative error below 1e-7.
    expect(r.values[0]!).toBeCloseTo(expected, 7);
    expect(r.values[1]!).toBeCloseTo(2 * expected, 7); // month 2 holds 2 sin(lat)
    expect(r.coverage[0]).toBe(1);
  });

  it('skips missing cells and renormalises: month 3 (lon 100–120 masked) keeps the same mean; coverage 340/360', () => {
    const r = reduceBox(sinlat, 'sinlat', { box: { lat: [10, 30], lon: [0, 360] } });
    expect(r.values[2]!).toBeCloseTo(bandMeanOfCentreSines(10, 30, 0.5), 7);
    expect(r.coverage[2]!).toBeCloseTo(340 / 360, 12);
  });

  it('over a descending-latitude grid with edges from midpoints: 0–90°N mean is 0.5 / cos 5° (analytic), global mean 0 (symmetry)', () => {
    const north = reduceBox(descending, 'tos', { box: { lat: [0, 90], lon: [-180, 180] } });
    expect(north.values[0]!).toBeCloseTo(0.5 / Math.cos(5 * DEG), 7);
    const globe = reduceBox(descending, 'tos', { box: { lat: [-90, 90], lon: [-180, 180] } });
    expect(Math.abs(globe.values[0]!)).toBeLessThan(1e-7);
    expect(north.provenance.areaSource).toMatch(/midpoints between centres/);
  });

  it('handles a box crossing ±180°: lonfield (= longitude) over 170°E → 160°W averages cells 175, −175, −165 to −55', () => {
    const r = reduceBox(descending, 'lonfield', { box: { lat: [-30, 30], lon: [170, -160] } });
    expect(r.values[0]!).toBeCloseTo(-55, 5);
    const symmetric = reduceBox(descending, 'lonfield', { box: { lat: [-30, 30], lon: [170, -170] } });
    expect(symmetric.values[0]!).toBeCloseTo(0, 5);
  });

  it('is thickness-weighted over a depth range: layers centred 5, 20, 45, 80 m (hand-computed weighted means)', () => {
    const mean = (range: [number, number]) => reduceBox(depth, 'dic', { box: { lat: [-90, 90], lon: [0, 360], depth: range } }).values;
    // [0, 100]: (10·5 + 20·20 + 30·45 + 40·80) / 100 = 50; month 2 holds twice the field.
    expect(mean([0, 100])).toEqual([expect.closeTo(50, 9), expect.closeTo(100, 9)]);
    // [0, 20]: (10·5 + 10·20) / 20 = 12.5
    expect(mean([0, 20])[0]!).toBeCloseTo(12.5, 9);
    // [15, 50]: (15·20 + 20·45) / 35
    expect(mean([15, 50])[0]!).toBeCloseTo(1200 / 35, 9);
  });

  it('refuses a depth range for a field without depth, and a box outside the grid', () => {
    expect(() => reduceBox(sinlat, 'sinlat', { box: { lat: [0, 10], lon: [0, 10], depth: [0, 10] } })).toThrow(/sinlat has no depth dimension/);
    expect(() => reduceBox(depth, 'dic', { box: { lat: [0, 10], lon: [0, 10], depth: [500, 1000] } })).toThrow(/no depth level of dic lies in 500..1000 m/);
    expect(() => reduceBox(sinlat, 'sinlat', { box: { lat: [95, 100], lon: [0, 10] } })).toThrow(/within −90..90/);
  });

  it('refuses a 1-D variable', () => {
    expect(() => reduceBox(sinlat, 'lat', { box: { lat: [0, 10], lon: [0, 10] } })).toThrow(/has no time dimension/);
  });
});

describe('reduceBox() integral', () => {
  it('uses the file areas named by cell_measures: ones over the globe = 4π·(6.0e6 m)² (sphere area, Archimedes)', () => {
    const r = reduceBox(sinlat, 'ones', { box: { lat: [-90, 90], lon: [0, 360] }, method: 'integral' });
    expect(r.values[0]! / (4 * Math.PI * R_FILE ** 2)).toBeCloseTo(1, 12);
    expect(r.units).toBe('1 m2');
    expect(r.provenance).toMatchObject({ method: 'area integral', radius: null, radiusConvention: 'areas read from the file' });
    expect(r.provenance.areaSource).toMatch(/areacello/);
  });

  it('clips cells partly inside the box: 10.25°N–29.75°N integral of ones = 2πR²(sin 29.75° − sin 10.25°) (zone area), with file areas and on the sphere alike', () => {
    const expected = 2 * Math.PI * R_FILE ** 2 * (Math.sin(29.75 * DEG) - Math.sin(10.25 * DEG));
    const box = { lat: [10.25, 29.75] as [number, number], lon: [0, 360] as [number, number] };
    const fromFile = reduceBox(sinlat, 'ones', { box, method: 'integral' });
    const onSphere = reduceBox(sinlat, 'ones', { box, method: 'integral', cellMeasures: false, radius: R_FILE });
    expect(fromFile.values[0]! / expected).toBeCloseTo(1, 12);
    expect(onSphere.values[0]! / expected).toBeCloseTo(1, 12);
    expect(onSphere.provenance.radius).toBe(R_FILE);
  });

  it('clips cells partly inside in longitude too, across 0°/360°: 355.5°E → 4.25°E over 0–30°N = R²·Δλ·sin 30° (Δλ = 8.75°)', () => {
    const expected = R_FILE ** 2 * 8.75 * DEG * Math.sin(30 * DEG);
    const r = reduceBox(sinlat, 'ones', { box: { lat: [0, 30], lon: [355.5, 4.25] }, method: 'integral', cellMeasures: false, radius: R_FILE });
    expect(r.values[0]! / expected).toBeCloseTo(1, 12);
    const fromFile = reduceBox(sinlat, 'ones', { box: { lat: [0, 30], lon: [355.5, 4.25] }, method: 'integral' });
    expect(fromFile.values[0]! / expected).toBeCloseTo(1, 12);
  });

  it('handles a box crossing 0°/360°: 350°E → 10°E holds 20/360 of the full-longitude integral', () => {
    const band = (lon: [number, number]) => reduceBox(sinlat, 'sinlat', { box: { lat: [10, 30], lon }, method: 'integral' }).values[0]!;
    expect(band([350, 10]) / band([0, 360])).toBeCloseTo(20 / 360, 12);
  });

  it('integrates over volume: dic over the globe and 0–100 m = 5000 m × 4πR², 4π(6371 km)² = 510,064,471.91 km² (common/test-fixtures/check-values.json)', () => {
    const r = reduceBox(depth, 'dic', { box: { lat: [-90, 90], lon: [0, 360] }, method: 'integral', radius: EARTH_RADIUS_6371_KM_M });
    // Σ dz·z = 10·5 + 20·20 + 30·45 + 40·80 = 5000 m²... times the sphere's area in m².
    expect(r.values[0]! / (5000 * 510_064_471.91e6)).toBeCloseTo(1, 10);
    expect(r.units).toBe('mol m-3 m3');
    expect(r.provenance).toMatchObject({ method: 'volume integral', radius: 6371000 });
    expect(r.provenance.depthSource).toMatch(/depth's bounds/);
  });

  it('sums only present cells and reports coverage for the masked month', () => {
    const r = reduceBox(sinlat, 'sinlat', { box: { lat: [10, 30], lon: [0, 360] }, method: 'integral' });
    expect(r.values[2]! / r.values[0]!).toBeCloseTo(340 / 360, 12);
  });
});

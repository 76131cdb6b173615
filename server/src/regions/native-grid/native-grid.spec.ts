import { regionsFromFlags } from '@upwell/common';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openNetcdf } from '../../series/netcdf/open-netcdf';
import type { NetcdfFile } from '../../series/netcdf/types';
import { readNativeHorizontalGrid } from './native-horizontal-grid';
import { integrateNativeRegions } from './native-region-integrals';
import { readNativeThickness } from './native-thickness';

// Fixtures and reference values: common/test-fixtures/scripts/grids_reference.py (netCDF4-python writes, xarray integrates).
const grids = (name: string) => resolve(__dirname, '../../../../common/test-fixtures/grids', name);
// The JSON read directly: the server's compilation root stops at server/src (shape: common/test-fixtures/grids-reference.ts).
const ref = JSON.parse(readFileSync(grids('grids_reference.json'), 'utf8')) as {
  nt: number;
  band_area_m2: number;
  grid: { lat: number[]; thkcello: number[] };
  regions: Record<string, { fgco2_integral_mol_s: number[]; full_depth_mol_s: Record<string, number[]>; top_100m_mol_s: Record<string, number[]>; inventory_full_mol: number[]; inventory_0_100m_mol: number[] }>;
};
const TERMS = ['dic_tend', 'dic_adv', 'dic_dif', 'dic_bio', 'dic_airsea', 'dic_other'];

describe('native-grid reading (rotated-pole fixture)', () => {
  let budget: NetcdfFile;
  let regionsFile: NetcdfFile;
  beforeAll(async () => {
    budget = await openNetcdf(grids('grids_budget.nc'));
    regionsFile = await openNetcdf(grids('grids_regions.nc'));
  });
  afterAll(() => {
    budget.close();
    regionsFile.close();
  });

  it('finds 2-D lat/lon through the coordinates attribute and the areas through cell_measures', () => {
    const g = readNativeHorizontalGrid(budget, 'dic_tend');
    expect(g.dims).toEqual(['y', 'x']);
    expect(g.latVariable).toBe('lat');
    expect(g.areaVariable).toBe('areacello');
    expect(g.volumeVariable).toBe('volcello');
    expect(Array.from(g.lat.subarray(0, 5))).toEqual(ref.grid.lat.slice(0, 5));
    expect(g.areas.reduce((s, a) => s + a, 0) / ref.band_area_m2).toBeCloseTo(1, 12);
  });

  it('takes thkcello as the cell thickness of a 3-D variable', () => {
    const g = readNativeHorizontalGrid(budget, 'dic_tend');
    const t = readNativeThickness(budget, 'dic_tend', g);
    expect(t.source).toBe('thkcello');
    expect(Array.from(t.thickness)).toEqual(ref.grid.thkcello);
  });

  it('integrates every budget term per region, 0–100 m and full depth, as xarray weighted(volume).sum() does', () => {
    const g = readNativeHorizontalGrid(budget, 'dic_tend');
    const t = readNativeThickness(budget, 'dic_tend', g);
    const codes = Float64Array.from(regionsFile.read('basin'));
    const regions = regionsFromFlags(codes, [1, 2, 3], 'tropical_pacific northern_band rest_of_ocean');
    for (const term of [...TERMS, 'dissic']) {
      const got = integrateNativeRegions(budget, term, g, t, regions, [100, null]);
      for (const s of got) {
        const r = ref.regions[s.region];
        const expected = term === 'dissic' ? (s.depthLimit === null ? r.inventory_full_mol : r.inventory_0_100m_mol) : (s.depthLimit === null ? r.full_depth_mol_s : r.top_100m_mol_s)[term];
        const scale = Math.max(...expected.map(Math.abs));
        for (let i = 0; i < ref.nt; i++) expect(Math.abs(s.values[i] - expected[i]) / scale, `${term} ${s.region} ${s.depthLimit}`).toBeLessThan(1e-12);
      }
    }
  });

  it('integrates a (time, y, x) flux over area', () => {
    const g = readNativeHorizontalGrid(budget, 'fgco2');
    const codes = Float64Array.from(regionsFile.read('basin'));
    const regions = regionsFromFlags(codes, [1, 2, 3], 'tropical_pacific northern_band rest_of_ocean');
    for (const s of integrateNativeRegions(budget, 'fgco2', g, null, regions, [100, null])) {
      const expected = ref.regions[s.region].fgco2_integral_mol_s;
      for (let i = 0; i < ref.nt; i++) expect(s.values[i] / expected[i]).toBeCloseTo(1, 12);
    }
  });

  it('refuses a curvilinear field without cell measures, naming what to add', async () => {
    const f = await openNetcdf(grids('grids_no_areas.nc'));
    try {
      expect(() => readNativeHorizontalGrid(f, 'fgco2')).toThrow(/fgco2 names no cell areas: add the model's cell-area variable in m2 \(e\.g\. areacello/);
    } finally {
      f.close();
    }
  });

  it('refuses a vertical axis without bounds or thickness, naming lev_bnds and thkcello', async () => {
    const f = await openNetcdf(grids('grids_no_bounds.nc'));
    try {
      const g = readNativeHorizontalGrid(f, 'dissic');
      expect(() => readNativeThickness(f, 'dissic', g)).toThrow(/axis lev of dissic has no bounds .* add lev_bnds or thkcello/);
    } finally {
      f.close();
    }
  });

  it('reads lev_bnds in centimeters with partial bottom cells cut at deptho when no thkcello is given', async () => {
    const g = readNativeHorizontalGrid(budget, 'dic_tend');
    // the same file seen without its thkcello and volcello: bounds (cm) + deptho must give the same thicknesses
    const hidden: NetcdfFile = Object.create(budget, {
      variables: { value: budget.variables.filter((x) => x.name !== 'thkcello' && x.name !== 'volcello') },
    });
    const t = readNativeThickness(hidden, 'dic_tend', { ...g, volumeVariable: null });
    expect(t.source).toMatch(/lev_bnds \(centimeters, positive down\) cut at deptho/);
    for (let i = 0; i < t.thickness.length; i++) expect(t.thickness[i]).toBeCloseTo(ref.grid.thkcello[i], 9);
  });

  it('names the area variable of the file that would do, and refuses areas in other units or on another grid', () => {
    const withAttributes = (name: string, change: (a: Record<string, unknown>) => Record<string, unknown>): NetcdfFile => {
      const variables = budget.variables.map((x) => (x.name === name ? { ...x, attributes: change({ ...x.attributes }) } : x));
      return Object.create(budget, { variables: { value: variables }, variable: { value: (n: string) => variables.find((x) => x.name === n)! } });
    };
    const noMeasures = withAttributes('fgco2', ({ cell_measures: _drop, ...rest }) => rest);
    expect(() => readNativeHorizontalGrid(noMeasures, 'fgco2')).toThrow(/areacello in this file would do: set fgco2:cell_measures = "area: areacello"/);
    const km = withAttributes('areacello', (a) => ({ ...a, units: 'km' }));
    expect(() => readNativeHorizontalGrid(km, 'fgco2')).toThrow(/cell areas areacello have units "km", not an area; expected m2/);
    const elsewhere = withAttributes('fgco2', (a) => ({ ...a, cell_measures: 'area: thkcello' }));
    expect(() => readNativeHorizontalGrid(elsewhere, 'fgco2')).toThrow(/cell areas thkcello are on \(lev, y, x\)/);
    const absent = withAttributes('fgco2', (a) => ({ ...a, cell_measures: 'area: areacella' }));
    expect(() => readNativeHorizontalGrid(absent, 'fgco2')).toThrow(/names areacella, which is not in this file/);
  });

  it('reads a regular grid (1-D lat and lon coordinate variables) with its cell_measures, expanding the centres per cell', () => {
    const v = (name: string, dims: string[], shape: number[], attributes: Record<string, string>) => ({ name, dims, shape, dtype: 'float64' as const, attributes });
    const data: Record<string, Float64Array> = { lat: Float64Array.of(-5, 5), lon: Float64Array.of(10, 20, 30), area: Float64Array.of(1, 2, 3, 4, 5, 6) };
    const variables = [
      v('lat', ['lat'], [2], { units: 'degrees_north' }),
      v('lon', ['lon'], [3], { units: 'degrees_east' }),
      v('area', ['lat', 'lon'], [2, 3], { units: 'm2' }),
      v('flux', ['time', 'lat', 'lon'], [1, 2, 3], { cell_measures: 'area: area' }),
    ];
    const fake = { variables, variable: (name: string) => variables.find((x) => x.name === name)!, read: (name: string) => data[name] } as unknown as NetcdfFile;
    const g = readNativeHorizontalGrid(fake, 'flux');
    expect(Array.from(g.lat)).toEqual([-5, -5, -5, 5, 5, 5]);
    expect(Array.from(g.lon)).toEqual([10, 20, 30, 10, 20, 30]);
    expect(Array.from(g.areas)).toEqual([1, 2, 3, 4, 5, 6]);
  });

  it('refuses a thickness that varies in time rather than fall back to static bounds', () => {
    const g = readNativeHorizontalGrid(budget, 'dic_tend');
    const variables = budget.variables.map((x) => (x.name === 'thkcello' ? { ...x, dims: ['time', ...x.dims], shape: [3, ...x.shape] } : x));
    const moving: NetcdfFile = Object.create(budget, { variables: { value: variables }, variable: { value: (n: string) => variables.find((x) => x.name === n)! } });
    expect(() => readNativeThickness(moving, 'dic_tend', g)).toThrow(/thkcello varies in time \(time, lev, y, x\)/);
  });
});

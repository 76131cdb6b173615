/**
 * Regional-budget bench (issue 16): writes a (time, lev, y, x) float32 NetCDF-4 file of five budget
 * terms on a 2-D-coordinate grid with areacello and thkcello (h5wasm, no Python), then integrates
 * every term over three regions for 0–100 m and full depth, one time step in memory at a time.
 * Prints throughput (M values/s) and peak RSS; when /usr/bin/python3 has xarray, times the same
 * integrals with xarray on the same file in the same run. Default shape: 12 months × 20 levels ×
 * 90 × 180 (5 terms = 19.4 M values), 1/252 of the 1° × 50 levels × 300 months × 5 terms
 * (4.9 G values); pass --months/--levels to grow it. Figures are printed, never asserted.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { encodeCfTime } from '@upwell/common';
import { loadH5wasm } from '../src/series/netcdf/load-esm';
import { openNetcdf } from '../src/series/netcdf/open-netcdf';
import { readNativeHorizontalGrid } from '../src/regions/native-grid/native-horizontal-grid';
import { integrateNativeRegions } from '../src/regions/native-grid/native-region-integrals';
import { readNativeThickness } from '../src/regions/native-grid/native-thickness';

/** Shape of the bench file. */
export interface BudgetBenchOptions {
  months?: number;
  levels?: number;
  ny?: number;
  nx?: number;
  /** Skip the xarray comparison (tests). */
  withoutXarray?: boolean;
}

/** Figures of one run. */
export interface BudgetBenchFigures {
  values: number;
  seconds: number;
  mValuesPerSecond: number;
  peakRssMB: number;
  xarraySeconds: number | null;
  /** Full-depth integral of the first term over the first region at month 1 (the field is 1 everywhere: the region's volume). */
  check: { integral: number; volume: number };
}

const TERMS = ['dic_tend', 'dic_adv', 'dic_dif', 'dic_bio', 'dic_airsea'];

/** Writes the file, runs the integrals, prints a table and returns the figures. */
export async function runBudgetBench(options: BudgetBenchOptions = {}): Promise<BudgetBenchFigures> {
  const months = options.months ?? 12;
  const levels = options.levels ?? 20;
  const ny = options.ny ?? 90;
  const nx = options.nx ?? 180;
  const dir = mkdtempSync(join(tmpdir(), 'upwell-budget-bench-'));
  const path = join(dir, 'bench-budget.nc');
  try {
    await writeBudgetFile(path, months, levels, ny, nx);
    let peak = process.memoryUsage().rss;
    const t0 = performance.now();
    const file = await openNetcdf(path);
    const grid = readNativeHorizontalGrid(file, TERMS[0]);
    const thickness = readNativeThickness(file, TERMS[0], grid);
    const cells = ny * nx;
    // Three regions: the tropics, the north, everything.
    const region = (keep: (lat: number) => boolean) => Uint8Array.from(grid.lat, (y) => (keep(y) ? 1 : 0));
    const regions = [
      { name: 'tropics', mask: region((y) => Math.abs(y) <= 15) },
      { name: 'north', mask: region((y) => y > 15) },
      { name: 'globe', mask: new Uint8Array(cells).fill(1) },
    ];
    let check = { integral: Number.NaN, volume: Number.NaN };
    for (const term of TERMS) {
      const out = integrateNativeRegions(file, term, grid, thickness, regions, [100, null]);
      if (term === TERMS[0]) check = { integral: out[5].values[0], volume: out[5].measure }; // globe, full depth
      peak = Math.max(peak, process.memoryUsage().rss);
    }
    file.close();
    const seconds = (performance.now() - t0) / 1000;
    const values = TERMS.length * months * levels * cells;
    const xarraySeconds = options.withoutXarray ? null : timeXarray(path);
    const figures = { values, seconds, mValuesPerSecond: values / 1e6 / seconds, peakRssMB: peak / 1e6, xarraySeconds, check };
    const rows: [string, string][] = [
      ['shape', `5 terms × ${months} months × ${levels} levels × ${ny} × ${nx}, float32 (${(values / 1e6).toFixed(1)} M values)`],
      ['Upwell: 3 regions × (0–100 m, full depth)', `${seconds.toFixed(2)} s = ${figures.mValuesPerSecond.toFixed(1)} M values/s`],
      ['peak RSS', `${figures.peakRssMB.toFixed(0)} MB (one time step = ${((levels * cells * 8) / 1e6).toFixed(1)} MB in float64)`],
      ['xarray, same integrals, same file', xarraySeconds === null ? 'not run (python3 with xarray not found)' : `${xarraySeconds.toFixed(2)} s = ${(values / 1e6 / xarraySeconds).toFixed(1)} M values/s`],
      ['check: globe full depth of 1 = volume', `${check.integral.toExponential(6)} vs ${check.volume.toExponential(6)}`],
    ];
    const width = Math.max(...rows.map((r) => r[0].length));
    console.log('Regional budget bench');
    for (const [k, v] of rows) console.log(`  ${k.padEnd(width)}  ${v}`);
    return figures;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Seconds xarray takes for the same region × depth integrals (opening included), or null without it. */
function timeXarray(path: string): number | null {
  if (!existsSync('/usr/bin/python3')) return null;
  const script = `
import sys, time
import numpy as np, xarray as xr
t0 = time.perf_counter()
ds = xr.open_dataset(sys.argv[1], decode_times=False)
thk = ds['thkcello']; top = thk.cumsum('lev') - thk
vol_full = ds['areacello'] * thk
vol_h = ds['areacello'] * xr.where((100 - top).clip(min=0) < thk, (100 - top).clip(min=0), thk)
masks = [abs(ds['lat']) <= 15, ds['lat'] > 15, ds['lat'] > -999]
for name in ${JSON.stringify(TERMS)}:
    v = ds[name]
    for m in masks:
        for w in (vol_h, vol_full):
            v.where(m).weighted(w).sum(('lev', 'y', 'x')).values
print(time.perf_counter() - t0)
`;
  const r = spawnSync('/usr/bin/python3', ['-c', script, path], { encoding: 'utf8' });
  return r.status === 0 ? Number(r.stdout.trim()) : null;
}

async function writeBudgetFile(path: string, months: number, levels: number, ny: number, nx: number): Promise<void> {
  const h5 = await loadH5wasm();
  const f = new h5.File(path, 'w');
  try {
    const scale = (name: string, data: Float64Array, attrs: Record<string, string>) => {
      const d = f.create_dataset({ name, data, shape: [data.length], dtype: '<d' });
      for (const [k, v] of Object.entries(attrs)) d.create_attribute(k, v);
      d.make_scale(name);
    };
    const time = Float64Array.from({ length: months }, (_, m) => encodeCfTime({ year: 2000 + Math.floor(m / 12), month: (m % 12) + 1, day: 15 }, 'days since 2000-01-01', 'noleap'));
    scale('time', time, { units: 'days since 2000-01-01', calendar: 'noleap', axis: 'T' });
    scale('lev', Float64Array.from({ length: levels }, (_, k) => 5 + 10 * k), { units: 'm', positive: 'down', axis: 'Z' });
    scale('y', Float64Array.from({ length: ny }, (_, j) => j), {});
    scale('x', Float64Array.from({ length: nx }, (_, i) => i), {});
    const cells = ny * nx;
    const lat = new Float64Array(cells);
    const lon = new Float64Array(cells);
    const area = new Float64Array(cells);
    const R = 6371000;
    for (let j = 0; j < ny; j++) {
      for (let i = 0; i < nx; i++) {
        lat[j * nx + i] = -90 + (180 / ny) * (j + 0.5);
        lon[j * nx + i] = (360 / nx) * (i + 0.5);
        area[j * nx + i] = R * R * ((2 * Math.PI) / nx) * (Math.sin((Math.PI / ny) * (j + 1) - Math.PI / 2) - Math.sin((Math.PI / ny) * j - Math.PI / 2));
      }
    }
    const field2d = (name: string, data: Float64Array, attrs: Record<string, string>) => {
      const d = f.create_dataset({ name, data, shape: [ny, nx], dtype: '<d' });
      for (const [k, v] of Object.entries(attrs)) d.create_attribute(k, v);
      d.attach_scale(0, '/y');
      d.attach_scale(1, '/x');
    };
    field2d('lat', lat, { units: 'degrees_north', standard_name: 'latitude' });
    field2d('lon', lon, { units: 'degrees_east', standard_name: 'longitude' });
    field2d('areacello', area, { units: 'm2', standard_name: 'cell_area' });
    const thk = new Float64Array(levels * cells).fill(10);
    const t = f.create_dataset({ name: 'thkcello', data: thk, shape: [levels, ny, nx], dtype: '<d' });
    t.create_attribute('units', 'm');
    t.create_attribute('standard_name', 'cell_thickness');
    ['/lev', '/y', '/x'].forEach((s, i) => t.attach_scale(i, s));
    const data = new Float32Array(months * levels * cells).fill(1);
    for (const name of TERMS) {
      const d = f.create_dataset({ name, data, shape: [months, levels, ny, nx], dtype: '<f', chunks: [1, levels, ny, nx] });
      d.create_attribute('units', 'mol m-3 s-1');
      d.create_attribute('coordinates', 'lat lon');
      d.create_attribute('cell_measures', 'area: areacello');
      ['/time', '/lev', '/y', '/x'].forEach((s, i) => d.attach_scale(i, s));
    }
    f.create_attribute('Conventions', 'CF-1.11');
  } finally {
    f.close();
  }
}

// Run when executed directly (node server/dist/bench/regional-budget.js), not when imported by a test.
if (typeof require !== 'undefined' && require.main === module) {
  const arg = (name: string) => {
    const i = process.argv.indexOf(`--${name}`);
    return i > 0 ? Number(process.argv[i + 1]) : undefined;
  };
  runBudgetBench({ months: arg('months'), levels: arg('levels') }).catch((error: unknown) => {
    console.error(error);
    process.exitCode = 1;
  });
}

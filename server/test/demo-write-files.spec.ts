import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseCsvForImport } from '../src/series/csv';
import { anomaly, pearson } from '@upwell/common';
import { describeNetcdf, openNetcdf, zonalMeanField } from '../src/series/netcdf';
import { generateDemoScenario, BUDGET_RESIDUAL_MAX, DEMO_FILES, type DemoManifest, writeDemoFiles } from '@upwell/demo-generator';

let root: string;
const written: Record<string, DemoManifest> = {};
beforeAll(async () => {
  root = await mkdtemp(join(tmpdir(), 'upwell-demo-'));
  for (const [name, seed, release] of [['a', undefined, 1], ['b', undefined, 1], ['c', 7, 1], ['r2', undefined, 2]] as const) {
    written[name] = await writeDemoFiles(join(root, name), { seed, release });
  }
}, 120_000);
afterAll(async () => {
  await rm(root, { recursive: true, force: true });
});

const hashes = (m: DemoManifest) => Object.fromEntries(m.files.map((f) => [f.file, f.sha256]));

describe('writeDemoFiles()', () => {
  it('writes byte-identical files for the same seed and release (sha256, FIPS 180-4 via node:crypto)', () => {
    expect(Object.keys(hashes(written.a)).sort()).toEqual(Object.values(DEMO_FILES).sort());
    expect(hashes(written.b)).toEqual(hashes(written.a));
  });

  it('writes different files for a different seed, and for release 2', () => {
    for (const file of Object.values(DEMO_FILES)) {
      expect(hashes(written.c)[file]).not.toBe(hashes(written.a)[file]);
    }
    expect(hashes(written.r2)[DEMO_FILES.budget]).not.toBe(hashes(written.a)[DEMO_FILES.budget]);
    // Release 2 corrects the carbon terms only; the index is the same run.
    expect(hashes(written.r2)[DEMO_FILES.index]).toBe(hashes(written.a)[DEMO_FILES.index]);
  });

  it('names the series exactly as the demo notebooks bind them', () => {
    expect(written.a.series.map((s) => `${s.name} | ${s.kind} | ${s.units} | ${s.origin}`)).toEqual([
      'Niño-like SST index (demo) | climate-index | °C | observation',
      'DIC inventory 0–100 m | carbon-inventory | Pg C | model-output',
      'DIC inventory full depth | carbon-inventory | Pg C | model-output',
      'DIC tendency 0–100 m | budget-term | Pg C/yr | model-output',
      'Horizontal advection 0–100 m | budget-term | Pg C/yr | model-output',
      'Vertical advection 0–100 m | budget-term | Pg C/yr | model-output',
      'Diffusion 0–100 m | budget-term | Pg C/yr | model-output',
      'Biology 0–100 m | budget-term | Pg C/yr | model-output',
      'Air–sea CO2 flux 0–100 m | flux | Pg C/yr | model-output',
    ]);
    for (const s of written.a.series) expect(s.description).toMatch(/synthetic/i);
    expect(written.a.fields[0]).toMatchObject({ file: 'surface-dic.nc', variable: 'surface_dic', longName: 'Surface DIC', zonalMeanName: 'Surface DIC, zonal mean 20°S–20°N' });
  });

  it('writes CSVs that the app\'s own CSV import reads as 552 monthly values from 1980-01, every manifest column found', async () => {
    for (const file of [DEMO_FILES.index, DEMO_FILES.budget, DEMO_FILES.inventory]) {
      const preview = await parseCsvForImport(await readFile(join(root, 'a', file), 'utf8'));
      const columns = written.a.series.filter((s) => s.file === file).map((s) => s.column);
      expect(preview.layout).toMatchObject({ kind: 'long', dateColumns: ['time'] });
      expect(preview.warnings).toEqual([]);
      for (const column of columns) {
        const found = preview.series.find((s) => s.column === column);
        expect(found, `${file}:${column}`).toMatchObject({ start: '1980-01', missingCount: 0 });
        expect(found!.values).toHaveLength(552);
      }
    }
  });

  it('closes the budget in the written file: |tendency − Σ terms| ≤ BUDGET_RESIDUAL_MAX in every month', async () => {
    const text = await readFile(join(root, 'r2', DEMO_FILES.budget), 'utf8');
    const [header, ...rows] = text.trim().split('\n');
    expect(header).toBe('time,tendency,horizontal_advection,vertical_advection,diffusion,biology,air_sea_co2_flux');
    expect(rows).toHaveLength(552);
    let largest = 0;
    for (const row of rows) {
      const [, tendency, ...terms] = row.split(',').map(Number);
      largest = Math.max(largest, Math.abs(tendency - terms.reduce((a, b) => a + b, 0)));
    }
    expect(largest).toBeLessThanOrEqual(BUDGET_RESIDUAL_MAX + 1e-9);
    expect(largest).toBeGreaterThan(0); // a residual is there, as stated
  });

  it('writes a NetCDF-4 file that the project reader opens, with time, lat, lon dimension scales and CF attributes', async () => {
    const f = await openNetcdf(join(root, 'a', DEMO_FILES.field));
    try {
      expect(f.format).toBe('netcdf4');
      expect(f.dimensions.map((d) => `${d.name}=${d.size}`)).toEqual(['time=552', 'nv=2', 'lat=20', 'lon=60']);
      const v = f.variable('surface_dic');
      expect(v.dims).toEqual(['time', 'lat', 'lon']);
      expect(v.dtype).toBe('float32');
      expect(v.attributes).toMatchObject({ long_name: 'Surface DIC', units: 'umol kg-1' });
      expect(f.variable('time').attributes).toMatchObject({ units: 'days since 1980-01-01', calendar: 'standard' });
      expect(f.globalAttributes.Conventions).toBe('CF-1.8');
      expect(String(f.globalAttributes.source)).toMatch(/synthetic/);
      const d = describeNetcdf(f);
      expect(d.time).toMatchObject({ start: '1980-01', end: '2025-12', months: 552, calendar: 'standard', fromBounds: true });
      expect(d.candidates.find((c) => c.name === 'surface_dic')).toMatchObject({ kind: 'field', layout: 'time-lat-lon' });
    } finally {
      f.close();
    }
  });

  it('has a zonal mean (the project reducer) whose index-driven anomaly reaches 15–19° later than the equator', async () => {
    const f = await openNetcdf(join(root, 'a', DEMO_FILES.field));
    try {
      const z = zonalMeanField(f, 'surface_dic', { lon: [120, 240], lat: [-20, 20] });
      const base = { from: '1991-01', to: '2020-12' };
      const anom = (values: number[]) => anomaly({ series: { start: z.start, values }, base }).anomaly.values as number[];
      const index = anom(Array.from(generateDemoScenario({ release: 1 }).index));
      // Lag (months) at which the row's anomaly is most negatively correlated with the index.
      const bestLag = (row: number) => {
        const a = anom(z.values.map((r) => r[row]!));
        let best = 0;
        let bestR = Infinity;
        for (let lag = 0; lag <= 12; lag++) {
          const r = pearson(index.slice(0, index.length - lag), a.slice(lag))!;
          if (r < bestR) [best, bestR] = [lag, r];
        }
        return { lag: best, r: bestR };
      };
      const equator = bestLag(z.lat.indexOf(1));
      const north = bestLag(z.lat.indexOf(17));
      const south = bestLag(z.lat.indexOf(-17));
      expect(equator.r).toBeLessThan(-0.8);
      expect(equator.lag).toBeLessThanOrEqual(1);
      expect(north.lag).toBeGreaterThanOrEqual(equator.lag + 3);
      expect(south.lag).toBeGreaterThanOrEqual(equator.lag + 3);
    } finally {
      f.close();
    }
  });
});

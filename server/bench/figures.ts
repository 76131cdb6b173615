/**
 * Figure bench: builds a temporary app with buildApp, uploads 600-month series (and a small
 * zonal-mean field) through the real routes, then times every recipe through HTTP on loopback,
 * cold (the figure cache cleared before each call) and cached. Build the server, then run
 * `node server/dist-bench/bench/figures.js [iterations]`. Figures are printed, never asserted: timings
 * depend on the machine. Targets: p95 < 50 ms cold, < 5 ms cached.
 */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { formatMonth, parseMonth, type FigureRecipe } from '@upwell/common';
import { buildApp } from '../src/app.factory';
import { FigureCache } from '../src/figures/figure-cache';
import { loadH5wasm } from '../src/series/netcdf/load-esm';

/** Options of one run. */
export interface FiguresBenchOptions {
  /** Timed calls per recipe and mode (bounded to 1..1000). */
  iterations?: number;
  months?: number;
}

/** Latency percentiles of one recipe, milliseconds. */
export interface FiguresBenchRow {
  kind: string;
  coldP50: number;
  coldP95: number;
  cachedP50: number;
  cachedP95: number;
  /** Whether every cached call said cached: true (a fast but wrong cache shows here). */
  allCached: boolean;
}

const MONTHS_DEFAULT = 600;

/** Runs the bench, prints a table and returns the rows. */
export async function runFiguresBench(options: FiguresBenchOptions = {}): Promise<FiguresBenchRow[]> {
  const iterations = Math.min(1000, Math.max(1, Math.floor(options.iterations ?? 50)));
  const months = options.months ?? MONTHS_DEFAULT;
  const dataDir = mkdtempSync(join(tmpdir(), 'upwell-figures-bench-'));
  const { app } = await buildApp({ DATA_DIR: dataDir, PORT: '0', WEB_DIST: '', AUTH_ATTEMPTS_PER_MINUTE: '10000', SEED_DEMO: 'false' }, { logger: false });
  try {
    await app.listen(0, '127.0.0.1');
    const { port } = app.getHttpServer().address() as { port: number };
    const api = client(`http://127.0.0.1:${port}/api`);
    const auth = await api.json('POST', '/auth/register', { name: 'Bench Person', email: `bench.${process.pid}@example.org`, password: 'correct horse battery' });
    api.token = auth.accessToken as string;
    const group = await api.json('POST', '/groups', { name: 'Bench group' });
    const notebook = await api.json('POST', `/groups/${group.id}/notebooks`, { title: 'Bench notebook' });

    const up = await api.upload(`/groups/${group.id}/uploads`, benchCsv(months), 'bench.csv');
    const col = (column: string, kind: string, units: string) => ({ column, skip: false, name: column, kind, variable: column, units });
    const imported = await api.json('POST', `/uploads/${up.uploadId}/import`, {
      origin: 'model-output',
      columns: [col('index', 'climate-index', 'degC'), col('flux', 'flux', 'Pg C/yr'), col('dic', 'carbon-inventory', 'Pg C'), col('adv', 'budget-term', 'Pg C/yr'), col('tendency', 'budget-term', 'Pg C/yr')],
    });
    const [index, flux, dic, adv, tendency] = (imported.series as { id: string }[]).map((s) => ({ seriesId: s.id }));
    const zonalFieldId = await uploadZonalField(api, group.id as string, months);

    const recipes: FigureRecipe[] = [
      { kind: 'timeseries', series: flux, index },
      { kind: 'seasonal-cycle', series: index },
      { kind: 'lag-correlation', index, series: flux, maxLag: 24 },
      { kind: 'composite', index, series: dic },
      { kind: 'event-table', index, carbon: [flux, dic] },
      { kind: 'budget', tendency, terms: [{ name: 'air–sea', series: flux }, { name: 'advection', series: adv }] },
      { kind: 'hovmoller', zonalFieldId },
      { kind: 'scatter', index, series: flux, lag: 3 },
    ];
    const cache = app.get(FigureCache);
    const rows: FiguresBenchRow[] = [];
    for (const recipe of recipes) {
      const url = `/notebooks/${notebook.id}/figures`;
      const cold: number[] = [];
      for (let i = 0; i < iterations; i++) {
        cache.clear();
        cold.push((await api.timed(url, { recipe })).ms);
      }
      const cached: number[] = [];
      let allCached = true;
      for (let i = 0; i < iterations; i++) {
        const r = await api.timed(url, { recipe });
        cached.push(r.ms);
        allCached &&= r.cached;
      }
      rows.push({ kind: recipe.kind, coldP50: pct(cold, 50), coldP95: pct(cold, 95), cachedP50: pct(cached, 50), cachedP95: pct(cached, 95), allCached });
    }
    printTable(rows, months, iterations);
    return rows;
  } finally {
    await app.close();
    rmSync(dataDir, { recursive: true, force: true });
  }
}

/** A minimal JSON client over fetch with the bearer token. */
function client(base: string) {
  const c = {
    token: '',
    async json(method: string, path: string, body?: unknown): Promise<Record<string, any>> {
      const res = await fetch(base + path, {
        method,
        headers: { 'content-type': 'application/json', ...(c.token ? { authorization: `Bearer ${c.token}` } : {}) },
        body: body === undefined ? undefined : JSON.stringify(body),
      });
      const out = (await res.json()) as Record<string, any>;
      if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${out.message}`);
      return out;
    },
    async upload(path: string, bytes: Buffer, name: string): Promise<Record<string, any>> {
      const form = new FormData();
      form.append('file', new Blob([new Uint8Array(bytes)]), name);
      const res = await fetch(base + path, { method: 'POST', headers: { authorization: `Bearer ${c.token}` }, body: form });
      const out = (await res.json()) as Record<string, any>;
      if (!res.ok) throw new Error(`upload ${name}: ${res.status} ${out.message}`);
      return out;
    },
    /** One figure call, timed from request to parsed body. */
    async timed(path: string, body: unknown): Promise<{ ms: number; cached: boolean }> {
      const t0 = performance.now();
      const out = await c.json('POST', path, body);
      return { ms: performance.now() - t0, cached: out.cached === true };
    },
  };
  return c;
}

/** Nearest-rank percentile. */
function pct(xs: number[], p: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.max(0, Math.ceil((p / 100) * s.length) - 1))];
}

/** A fictional index with ENSO-like bumps every ~4 years and carbon series that answer it. */
function benchCsv(months: number): Buffer {
  const start = parseMonth('1975-01');
  // One bump every 47 months, warm and cold in turn.
  const enso = (t: number) => (Math.floor(t / 47) % 2 === 0 ? 1.8 : -1.4) * Math.exp(-((((t % 47) - 20) / 6) ** 2));
  const lines = ['date,index,flux,dic,adv,tendency'];
  for (let t = 0; t < months; t++) {
    const index = 27 + Math.cos((2 * Math.PI * t) / 12) + enso(t) + 0.1 * Math.sin(t * 1.7);
    const flux = 0.6 - 0.35 * enso(t - 3) + 0.02 * Math.cos(t * 2.3);
    const adv = 0.3 * Math.sin((2 * Math.PI * t) / 7);
    const row = [index, flux, 38 + 0.001 * t + 0.5 * enso(t - 6), adv, flux + adv + 0.005 * Math.sin(t * 3.1)];
    lines.push(`${formatMonth(start + t)}-15,${row.map((v) => v.toFixed(6)).join(',')}`);
  }
  return Buffer.from(lines.join('\n') + '\n');
}

/** Writes a (time, lat, lon) NetCDF-4 file, uploads it and makes its zonal mean; returns the field id. */
async function uploadZonalField(api: ReturnType<typeof client>, groupId: string, months: number): Promise<string> {
  const dir = mkdtempSync(join(tmpdir(), 'upwell-figures-bench-nc-'));
  try {
    const path = join(dir, 'field.nc');
    const h5 = await loadH5wasm();
    const f = new h5.File(path, 'w');
    const lat = Float64Array.from({ length: 36 }, (_, j) => -87.5 + 5 * j);
    const lon = Float64Array.from([60, 180, 300]);
    try {
      const coord = (name: string, data: Float64Array, attrs: Record<string, string>) => {
        const d = f.create_dataset({ name, data, shape: [data.length], dtype: '<d' });
        for (const [k, v] of Object.entries(attrs)) d.create_attribute(k, v);
        d.make_scale(name);
      };
      coord('time', Float64Array.from({ length: months }, (_, m) => m * 30 + 15), { units: 'days since 1975-01-01', calendar: '360_day', axis: 'T', standard_name: 'time' });
      coord('lat', lat, { units: 'degrees_north', standard_name: 'latitude', axis: 'Y' });
      coord('lon', lon, { units: 'degrees_east', standard_name: 'longitude', axis: 'X' });
      const data = new Float32Array(months * lat.length * lon.length);
      for (let k = 0; k < data.length; k++) {
        const m = Math.floor(k / (lat.length * lon.length));
        data[k] = 2 + Math.sin((2 * Math.PI * m) / 12) + 0.01 * (k % 97);
      }
      const v = f.create_dataset({ name: 'dic', data, shape: [months, lat.length, lon.length], dtype: '<f' });
      v.create_attribute('units', 'mol C m-3');
      v.attach_scale(0, '/time');
      v.attach_scale(1, '/lat');
      v.attach_scale(2, '/lon');
    } finally {
      f.close();
    }
    const up = await api.upload(`/groups/${groupId}/uploads`, readFileSync(path), 'field.nc');
    const imp = await api.json('POST', `/uploads/${up.uploadId}/import`, { grids: [{ variable: 'dic', name: 'Bench DIC' }] });
    const red = await api.json('POST', `/fields/${imp.fields[0].id}/reductions`, { kind: 'zonal-mean', name: 'Bench DIC zonal mean', lon: [0, 360] });
    return red.zonal.id as string;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

function printTable(rows: FiguresBenchRow[], months: number, iterations: number): void {
  const f = (x: number) => x.toFixed(2).padStart(8);
  console.log(`Figure bench: ${months}-month series, ${iterations} calls per recipe and mode, HTTP on loopback (ms)`);
  console.log(`  ${'recipe'.padEnd(16)}${'cold p50'.padStart(9)}${'cold p95'.padStart(9)}${'hit p50'.padStart(9)}${'hit p95'.padStart(9)}  cached`);
  for (const r of rows) console.log(`  ${r.kind.padEnd(16)} ${f(r.coldP50)} ${f(r.coldP95)} ${f(r.cachedP50)} ${f(r.cachedP95)}  ${r.allCached ? 'yes' : 'NO'}`);
  console.log('  targets: p95 < 50 ms cold, < 5 ms cached');
}

// Run when executed directly (node server/dist-bench/bench/figures.js [iterations]), not when imported by a test.
if (typeof require !== 'undefined' && require.main === module) {
  runFiguresBench({ iterations: process.argv[2] ? Number(process.argv[2]) : undefined }).catch((error: unknown) => {
    console.error(error);
    process.exitCode = 1;
  });
}

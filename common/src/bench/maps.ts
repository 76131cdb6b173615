/**
 * Benchmarks of the maps engine (part of `npm run bench`): a correlation map of a 1° global field
 * × 300 months on an index at one lag, beside the same work in numpy vectorised over cells
 * (maps_numpy.py, run on the same bytes when python3 with numpy is installed), and a composite map
 * of a 0.25° global field × 300 months. Printed, never asserted.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { computeMap } from '../maps/compute-map';
import type { MapEvent } from '../maps/composite-months';
import type { MapFieldSource } from '../maps/map-types';
import { formatMonth } from '../series/month';
import { mulberry32, normalVariate } from '../stats/prng';
import type { BenchCase } from './run';

const MONTHS = 300;
const FIRST = 1996 * 12; // 1996-01 … 2020-12
const BASE = { from: '1996-01', to: '2020-12' };

/** A seeded (time, lat, lon) Float32 field held in memory: seasonal cycle + index response + noise, ~30 % land (NaN). */
export function syntheticField(nlat: number, nlon: number, months: number, index: Float64Array, seed = 3): Float32Array {
  const rng = mulberry32(seed);
  const cells = nlat * nlon;
  const field = new Float32Array(months * cells);
  const gain = Float32Array.from({ length: cells }, () => normalVariate(rng));
  for (let t = 0; t < months; t++) {
    const season = Math.cos((2 * Math.PI * t) / 12);
    for (let c = 0; c < cells; c++) {
      const land = c % nlon < nlon * 0.3 && ((c / nlon) | 0) % 3 !== 0;
      field[t * cells + c] = land ? NaN : 20 + season + gain[c] * index[t] + normalVariate(rng);
    }
  }
  return field;
}

/** A slice source over an in-memory field (the read is a copy, as a decoded hyperslab would be). */
export function memorySource(field: Float32Array, cells: number, first = FIRST): MapFieldSource {
  const months = field.length / cells;
  return {
    first,
    last: first + months - 1,
    cells,
    read(month, out) {
      const t = month - first;
      if (t < 0 || t >= months) return false;
      const slice = field.subarray(t * cells, (t + 1) * cells);
      for (let c = 0; c < cells; c++) out[c] = slice[c];
      return true;
    },
  };
}

/** An AR(1) index of `months` values. */
export function syntheticIndex(months: number, seed = 9): Float64Array {
  const rng = mulberry32(seed);
  const x = new Float64Array(months);
  for (let t = 1; t < months; t++) x[t] = 0.9 * x[t - 1] + 0.4 * normalVariate(rng);
  return x;
}

/**
 * A 0.25° source that never holds the whole field (311 M values): each slice is a fixed pattern
 * plus one of seven noise slices plus a per-month offset, so a read costs about what a copy does.
 */
function quarterDegreeSource(index: Float64Array): MapFieldSource {
  const nlat = 720, nlon = 1440, cells = nlat * nlon;
  const rng = mulberry32(4);
  const pattern = Float32Array.from({ length: cells }, (_, c) => (c % nlon < nlon * 0.3 && ((c / nlon) | 0) % 3 !== 0 ? NaN : 20 + normalVariate(rng)));
  const noise = Array.from({ length: 7 }, () => Float32Array.from({ length: cells }, () => normalVariate(rng)));
  return {
    first: FIRST,
    last: FIRST + MONTHS - 1,
    cells,
    read(month, out) {
      const t = month - FIRST;
      const n = noise[t % 7];
      const shift = index[t] + Math.cos((2 * Math.PI * t) / 12);
      for (let c = 0; c < cells; c++) out[c] = pattern[c] + n[c] + shift;
      return true;
    },
  };
}

/** Warm events every ~4 years, peaks in December. */
function benchEvents(): MapEvent[] {
  return Array.from({ length: 6 }, (_, k) => {
    const peak = FIRST + 11 + 48 * k;
    return { phase: 'warm' as const, start: formatMonth(peak - 5), peak: formatMonth(peak), end: formatMonth(peak + 4) };
  });
}

/** The maps cases of the engine bench. */
export const MAPS_BENCH_CASES: BenchCase[] = [
  {
    name: 'correlation map, 1° global × 300 months, one lag (+ p, FDR)',
    values: 180 * 360 * MONTHS,
    setup: () => {
      const index = syntheticIndex(MONTHS);
      const source = memorySource(syntheticField(180, 360, MONTHS, index), 180 * 360);
      const series = { start: formatMonth(FIRST), values: Array.from(index) };
      return () => {
        computeMap(source, { mode: 'correlation', base: BASE, index: series, lag: 2 });
      };
    },
  },
  {
    name: 'composite map, 0.25° global × 300 months (Welch p, FDR)',
    values: 720 * 1440 * MONTHS,
    targetMs: 2000,
    setup: () => {
      const index = syntheticIndex(MONTHS);
      const source = quarterDegreeSource(index);
      const events = benchEvents();
      return () => {
        computeMap(source, { mode: 'composite', base: BASE, events, offsets: [-1, 0, 1], baseline: 'neutral' });
      };
    },
  },
];

/**
 * The same correlation map in numpy (maps_numpy.py, vectorised over cells), on the same Float32
 * bytes written to a temporary file: best time in ms, or the reason it could not run.
 */
export function numpyCorrelationMapMs(): { ms: number; cpuMs: number } | { unavailable: string } {
  const index = syntheticIndex(MONTHS);
  const field = syntheticField(180, 360, MONTHS, index);
  const dir = mkdtempSync(join(tmpdir(), 'upwell-maps-bench-'));
  try {
    writeFileSync(join(dir, 'field.f32'), Buffer.from(field.buffer, field.byteOffset, field.byteLength));
    writeFileSync(join(dir, 'index.f64'), Buffer.from(index.buffer));
    // The script sits beside this file's source; from common/dist/bench that is ../../src/bench.
    const script = [join(__dirname, 'maps_numpy.py'), join(__dirname, '..', '..', 'src', 'bench', 'maps_numpy.py')].find((p) => existsSync(p));
    if (!script) return { unavailable: 'maps_numpy.py not found' };
    const out = execFileSync('python3', [script, dir, '180', '360', String(MONTHS), '2'], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });
    const measured = JSON.parse(out.trim().split('\n').pop()!) as { bestMs: number; bestCpuMs: number };
    return { ms: measured.bestMs, cpuMs: measured.bestCpuMs };
  } catch (err) {
    return { unavailable: `python3 with numpy not available (${(err as Error).message.split('\n')[0]})` };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/**
 * Benchmark of the engine's hot paths (a plain script: prints a table and exits 0).
 * Run with `npm run bench` (node --expose-gc common/dist/bench/run.js). Each case is warmed up,
 * then timed several times after a garbage collection where available; the best time is reported
 * with its throughput. Other benches can add cases to BENCH_CASES or call runBench with their own.
 */
import { anomaly } from '../series/anomaly';
import { lagCorrelation } from '../stats/lag-correlation';
import { areaMeanSeries } from '../grid/area-mean-series';
import { cellAreas } from '../grid/cell-areas';
import { mulberry32, normalVariate } from '../stats/prng';

/** One benchmark case: `setup` builds the data once, `run` is the timed operation. */
export interface BenchCase {
  name: string;
  /** Number of input values one run processes (for the throughput column). */
  values: number;
  /** What the case should stay under on one core, ms (informative, not asserted). */
  targetMs?: number;
  setup: () => () => void;
}

/** One measured case. */
export interface BenchResult {
  name: string;
  bestMs: number;
  medianMs: number;
  mValuesPerSecond: number;
  targetMs?: number;
}

const SERIES = 1000;
const MONTHS = 600;

/** 1,000 seeded synthetic monthly series of 600 months from 1960-01: seasonal cycle + AR(1) noise. */
export function syntheticSeries(count = SERIES, months = MONTHS, seed = 1): { start: string; values: number[] }[] {
  const rng = mulberry32(seed);
  return Array.from({ length: count }, () => {
    const values: number[] = new Array(months);
    let a = 0;
    for (let i = 0; i < months; i++) {
      a = 0.7 * a + normalVariate(rng);
      values[i] = 25 + 2 * Math.cos((2 * Math.PI * i) / 12) + a;
    }
    return { start: '1960-01', values };
  });
}

/** The standard cases: anomalies of all series, a ±36-month lag scan of each against one index, a 288×180×360 area mean. */
export const BENCH_CASES: BenchCase[] = [
  {
    name: 'anomaly, 1000 series × 600 months, base 1971–2000',
    values: SERIES * MONTHS,
    targetMs: 10,
    setup: () => {
      const series = syntheticSeries();
      return () => {
        for (const s of series) anomaly({ series: s, base: { from: '1971-01', to: '2000-12' } });
      };
    },
  },
  {
    name: 'lag-correlation ±36, 1000 series × 600 months vs one index',
    values: SERIES * MONTHS * 73,
    targetMs: 200,
    setup: () => {
      const series = syntheticSeries();
      const index = syntheticSeries(1, MONTHS, 99)[0];
      return () => {
        for (const s of series) lagCorrelation({ x: s, y: index, maxLag: 36, surrogates: 0 });
      };
    },
  },
  {
    name: 'lag-correlation ±24 with pSearch (1000 surrogates), 10 series × 600 months vs one index',
    values: 10 * 1000 * MONTHS * 49,
    // Each surrogate is one inverse FFT plus one lag scan, so about 1000 × the ±24 part of the case above per series.
    targetMs: 2000,
    setup: () => {
      const series = syntheticSeries(10);
      const index = syntheticSeries(1, MONTHS, 99)[0];
      return () => {
        for (const s of series) lagCorrelation({ x: s, y: index, maxLag: 24, surrogates: 1000 });
      };
    },
  },
  {
    name: 'area-mean series, 288 × 180 × 360 Float32 field',
    values: 288 * 180 * 360,
    targetMs: 25,
    setup: () => {
      const areas = cellAreas(Array.from({ length: 181 }, (_, i) => -90 + i), Array.from({ length: 361 }, (_, i) => i));
      const field = new Float32Array(288 * 180 * 360);
      const land = blockLandMask(180, 360);
      const rng = mulberry32(5);
      // An ocean field: NaN on a fixed, spatially coherent land mask (about 30% of cells), as model output has.
      for (let k = 0; k < field.length; k++) field[k] = land[k % land.length] ? NaN : 15 + 10 * rng();
      return () => {
        areaMeanSeries(field, 180, 360, areas);
      };
    },
  },
];

/** A crude fixed land mask of rectangular continents plus Antarctica (1 = land), about 30% of cells. */
function blockLandMask(nlat: number, nlon: number): Uint8Array {
  const land = new Uint8Array(nlat * nlon);
  const blocks = [[60, 150, 20, 60], [30, 170, 100, 140], [80, 160, 250, 300], [0, 15, 0, 360]];
  for (const [i0, i1, j0, j1] of blocks) for (let i = i0; i < i1; i++) for (let j = j0; j < j1; j++) land[i * nlon + j] = 1;
  return land;
}

/** Times each case: `warmups` untimed runs (so V8 reaches its optimised code), then `repeats` timed runs. */
export function runBench(cases: BenchCase[] = BENCH_CASES, repeats = 10, warmups = 5): BenchResult[] {
  const gc = (globalThis as { gc?: () => void }).gc;
  return cases.map((c) => {
    const run = c.setup();
    for (let w = 0; w < warmups; w++) run();
    const times: number[] = [];
    for (let r = 0; r < repeats; r++) {
      gc?.();
      const t0 = performance.now();
      run();
      times.push(performance.now() - t0);
    }
    times.sort((a, b) => a - b);
    const bestMs = times[0];
    return { name: c.name, bestMs, medianMs: times[Math.floor(times.length / 2)], mValuesPerSecond: c.values / bestMs / 1e3, targetMs: c.targetMs };
  });
}

/** Formats results as a fixed-width text table. */
export function formatBench(results: BenchResult[]): string {
  const head = `${'case'.padEnd(62)} ${'best ms'.padStart(9)} ${'median ms'.padStart(10)} ${'Mvalues/s'.padStart(10)} ${'target ms'.padStart(10)}`;
  const lines = results.map(
    (r) =>
      `${r.name.padEnd(62)} ${r.bestMs.toFixed(2).padStart(9)} ${r.medianMs.toFixed(2).padStart(10)} ${r.mValuesPerSecond.toFixed(1).padStart(10)} ${(r.targetMs === undefined ? '' : `< ${r.targetMs}`).padStart(10)}`,
  );
  return [head, ...lines].join('\n');
}

if (require.main === module) {
  console.log(formatBench(runBench()));
  // Maps: heavier cases, fewer runs; numpy's time for the 1° correlation map measured in the same run.
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const maps = require('./maps') as typeof import('./maps');
  console.log(formatBench(runBench(maps.MAPS_BENCH_CASES, 3, 1)));
  const numpy = maps.numpyCorrelationMapMs();
  console.log('unavailable' in numpy ? `numpy correlation map, same field: unavailable — ${numpy.unavailable}` : `numpy correlation map, same field and work, vectorised over cells: best ${numpy.ms.toFixed(2)} ms (CPU ${numpy.cpuMs.toFixed(2)} ms)`);
}

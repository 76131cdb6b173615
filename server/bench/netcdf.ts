/**
 * NetCDF bench: writes a ~100 MB (time, lat, lon) float32 NetCDF-4 file with h5wasm (no Python
 * needed), then times reading it, a box mean and a zonal mean with the series library's reader.
 * Build the server, then run `node server/dist-bench/bench/netcdf.js`. Figures are printed, never
 * asserted: timings depend on the machine. Targets: ≥ 100 MB/s ingest, reductions under 1 s.
 */
import { mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { encodeCfTime } from '@upwell/common';
import { createCfDecoder } from '../src/series/netcdf/cf-decoder';
import { describeNetcdf } from '../src/series/netcdf/describe-netcdf';
import { loadH5wasm } from '../src/series/netcdf/load-esm';
import { openNetcdf } from '../src/series/netcdf/open-netcdf';
import { reduceBox } from '../src/series/netcdf/reduce-box';
import { zonalMeanField } from '../src/series/netcdf/zonal-mean-field';
import { DEFAULT_NETCDF_LIMITS } from '../src/series/netcdf/size-limits';
import { WorkerThreadJobRunner } from '../src/jobs/worker-thread-job-runner';

/** Grid of the bench file; the defaults give 400 × 180 × 360 float32 = 103.7 MB. */
export interface NetcdfBenchOptions {
  months?: number;
  nlat?: number;
  nlon?: number;
  /** Keep the file (its path is in the result) instead of deleting it. */
  keep?: boolean;
}

/** Figures from one run (seconds, MB = 10^6 bytes). */
export interface NetcdfBenchFigures {
  path: string;
  fileMB: number;
  dataMB: number;
  writeSeconds: number;
  openAndDescribeSeconds: number;
  readSeconds: number;
  readMBps: number;
  globalBoxMeanSeconds: number;
  tropicalBoxMeanSeconds: number;
  zonalMeanSeconds: number;
  /**
   * The event loop during the global box mean, sampled every 10 ms: worst delay of a 10 ms timer
   * when the mean runs on the loop itself (the reference: how the server behaved before jobs) and
   * when it runs as a job in a worker thread (how `/api/health` and co-editing fare meanwhile).
   */
  loopDelayMs: { onLoop: number; inWorker: number; workerSeconds: number };
  /** Sanity figures, so a fast but wrong run shows: global mean of month 1 and zonal mean at the first row. */
  checks: { globalMeanMonth1: number | null; zonalFirstRowMonth1: number | null };
}

const UNITS = 'days since 1980-01-01';
const CALENDAR = 'noleap';

/** Writes the bench file, runs the timings, prints a table and returns the figures. */
export async function runNetcdfBench(options: NetcdfBenchOptions = {}): Promise<NetcdfBenchFigures> {
  const months = options.months ?? 400;
  const nlat = options.nlat ?? 180;
  const nlon = options.nlon ?? 360;
  const dir = mkdtempSync(join(tmpdir(), 'upwell-netcdf-bench-'));
  const path = join(dir, 'bench-tos.nc');
  try {
    let t0 = performance.now();
    await writeBenchFile(path, months, nlat, nlon);
    const writeSeconds = (performance.now() - t0) / 1000;

    t0 = performance.now();
    const file = await openNetcdf(path);
    describeNetcdf(file);
    const openAndDescribeSeconds = (performance.now() - t0) / 1000;

    // Ingest: every time step read as a hyperslab and CF-decoded, as the field import does.
    t0 = performance.now();
    const tos = file.variable('tos');
    const decoder = createCfDecoder(tos);
    const step = new Float64Array(nlat * nlon);
    for (let t = 0; t < months; t++) decoder.decode(file.read('tos', { start: [t, 0, 0], count: [1, nlat, nlon] }), step);
    const readSeconds = (performance.now() - t0) / 1000;
    const dataMB = (months * nlat * nlon * 4) / 1e6;

    t0 = performance.now();
    const globe = reduceBox(file, 'tos', { box: { lat: [-90, 90], lon: [0, 360] } });
    const globalBoxMeanSeconds = (performance.now() - t0) / 1000;

    t0 = performance.now();
    reduceBox(file, 'tos', { box: { lat: [-5, 5], lon: [190, 240] } });
    const tropicalBoxMeanSeconds = (performance.now() - t0) / 1000;

    t0 = performance.now();
    const zonal = zonalMeanField(file, 'tos', { lon: [0, 360] });
    const zonalMeanSeconds = (performance.now() - t0) / 1000;
    file.close();

    const onLoop = await worstLoopDelay(async () => {
      const f = await openNetcdf(path);
      try {
        reduceBox(f, 'tos', { box: { lat: [-90, 90], lon: [0, 360] } });
      } finally {
        f.close();
      }
    });
    const runner = new WorkerThreadJobRunner(1);
    let inWorker: { worstMs: number; seconds: number };
    try {
      // A first job starts the worker, so the figure is the reduction, not the thread's start.
      await runner.run('netcdf-preview', { path, limits: DEFAULT_NETCDF_LIMITS });
      inWorker = await worstLoopDelay(() => runner.run('reduce-box', { path, limits: DEFAULT_NETCDF_LIMITS, variable: 'tos', options: { box: { lat: [-90, 90], lon: [0, 360] } } }));
    } finally {
      await runner.close();
    }

    const figures: NetcdfBenchFigures = {
      path,
      fileMB: statSync(path).size / 1e6,
      dataMB,
      writeSeconds,
      openAndDescribeSeconds,
      readSeconds,
      readMBps: dataMB / readSeconds,
      globalBoxMeanSeconds,
      tropicalBoxMeanSeconds,
      zonalMeanSeconds,
      loopDelayMs: { onLoop: onLoop.worstMs, inWorker: inWorker.worstMs, workerSeconds: inWorker.seconds },
      checks: { globalMeanMonth1: globe.values[0], zonalFirstRowMonth1: zonal.values[0][0] },
    };
    printTable(figures, months, nlat, nlon);
    return figures;
  } finally {
    if (!options.keep) rmSync(dir, { recursive: true, force: true });
  }
}

/** Worst lateness of a 10 ms timer while `work` runs, and how long it ran. */
async function worstLoopDelay(work: () => Promise<unknown>): Promise<{ worstMs: number; seconds: number }> {
  let worst = 0;
  let last = performance.now();
  const timer = setInterval(() => {
    const now = performance.now();
    worst = Math.max(worst, now - last - 10);
    last = now;
  }, 10);
  const t0 = performance.now();
  // Let the timer tick once before the work starts, so a synchronous reduction is caught.
  await new Promise((r) => setTimeout(r, 20));
  try {
    await work();
    await new Promise((r) => setTimeout(r, 20));
  } finally {
    clearInterval(timer);
  }
  return { worstMs: Math.max(0, worst), seconds: (performance.now() - t0) / 1000 };
}

/**
 * A NetCDF-4-shaped HDF5 file: dimension-scale datasets time/lat/lon with CF attributes, and
 * tos(time, lat, lon) float32, chunked one month per chunk, with a _FillValue over a fictional
 * continent so the decoder has work to do.
 */
async function writeBenchFile(path: string, months: number, nlat: number, nlon: number): Promise<void> {
  const h5 = await loadH5wasm();
  const f = new h5.File(path, 'w');
  try {
    const time = new Float64Array(months);
    for (let m = 0; m < months; m++) {
      const date = { year: 1980 + Math.floor(m / 12), month: (m % 12) + 1, day: 15 };
      time[m] = encodeCfTime(date, UNITS, CALENDAR);
    }
    const lat = Float64Array.from({ length: nlat }, (_, j) => -90 + (180 / nlat) * (j + 0.5));
    const lon = Float64Array.from({ length: nlon }, (_, i) => (360 / nlon) * (i + 0.5));
    const coordinate = (name: string, data: Float64Array, attrs: Record<string, string>) => {
      const d = f.create_dataset({ name, data, shape: [data.length], dtype: '<d' });
      for (const [k, v] of Object.entries(attrs)) d.create_attribute(k, v);
      d.make_scale(name);
    };
    coordinate('time', time, { units: UNITS, calendar: CALENDAR, axis: 'T', standard_name: 'time' });
    coordinate('lat', lat, { units: 'degrees_north', standard_name: 'latitude', axis: 'Y' });
    coordinate('lon', lon, { units: 'degrees_east', standard_name: 'longitude', axis: 'X' });

    const fill = 1e20;
    const cells = nlat * nlon;
    const data = new Float32Array(months * cells);
    for (let m = 0; m < months; m++) {
      const season = Math.sin((2 * Math.PI * m) / 12);
      for (let j = 0; j < nlat; j++) {
        const base = 20 + 10 * Math.cos((lat[j] * Math.PI) / 180);
        for (let i = 0; i < nlon; i++) {
          const land = lat[j] > 10 && lat[j] < 50 && lon[i] > 60 && lon[i] < 120;
          data[m * cells + j * nlon + i] = land ? fill : base + season;
        }
      }
    }
    const tos = f.create_dataset({ name: 'tos', data, shape: [months, nlat, nlon], dtype: '<f', chunks: [1, nlat, nlon] });
    tos.create_attribute('units', 'degC');
    tos.create_attribute('long_name', 'fictional sea surface temperature');
    tos.create_attribute('_FillValue', Float32Array.of(fill), [1], '<f');
    tos.attach_scale(0, '/time');
    tos.attach_scale(1, '/lat');
    tos.attach_scale(2, '/lon');
    f.create_attribute('Conventions', 'CF-1.11');
    f.create_attribute('title', 'Upwell NetCDF bench (fictional model)');
  } finally {
    f.close();
  }
}

function printTable(x: NetcdfBenchFigures, months: number, nlat: number, nlon: number): void {
  const rows: [string, string][] = [
    ['grid', `${months} months × ${nlat} lat × ${nlon} lon, float32`],
    ['file size', `${x.fileMB.toFixed(1)} MB`],
    ['write (h5wasm)', `${x.writeSeconds.toFixed(2)} s`],
    ['open + describe', `${x.openAndDescribeSeconds.toFixed(3)} s`],
    ['read + decode, step by step', `${x.readSeconds.toFixed(2)} s = ${x.readMBps.toFixed(0)} MB/s (target ≥ 100)`],
    ['global box mean', `${x.globalBoxMeanSeconds.toFixed(2)} s (target < 1)`],
    ['tropical box mean (5S–5N, 190–240E)', `${x.tropicalBoxMeanSeconds.toFixed(3)} s`],
    ['zonal mean, all longitudes', `${x.zonalMeanSeconds.toFixed(2)} s (target < 1)`],
    ['event loop during the global mean: on the loop (reference)', `worst timer delay ${x.loopDelayMs.onLoop.toFixed(0)} ms`],
    ['event loop during the global mean: as a job in a worker', `worst timer delay ${x.loopDelayMs.inWorker.toFixed(0)} ms (job ${x.loopDelayMs.workerSeconds.toFixed(2)} s; /api/health bound 1000 ms)`],
    ['check: global mean, month 1', String(x.checks.globalMeanMonth1)],
    ['check: zonal mean, first row, month 1', String(x.checks.zonalFirstRowMonth1)],
  ];
  const width = Math.max(...rows.map((r) => r[0].length));
  console.log('NetCDF bench');
  for (const [k, v] of rows) console.log(`  ${k.padEnd(width)}  ${v}`);
}

// Run when executed directly (node server/dist-bench/bench/netcdf.js), not when imported by a test.
if (typeof require !== 'undefined' && require.main === module) {
  runNetcdfBench().catch((error: unknown) => {
    console.error(error);
    process.exitCode = 1;
  });
}

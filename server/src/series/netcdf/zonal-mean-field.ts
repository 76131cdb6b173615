import { EARTH_RADIUS_GRS80_MEAN_M, weightedSum } from '@upwell/common';
import { stringAttribute } from './attributes';
import { createCfDecoder } from './cf-decoder';
import { findCoordinates } from './coordinates';
import { resolveGridLayout } from './grid-layout';
import { gridWeights, type Box } from './grid-weights';
import { radiusConvention } from './radius-convention';
import type { ReductionOptions, ReductionProvenance } from './reduction-types';
import { readMonthlyTime } from './time-axis';
import type { NetcdfFile } from './types';

/** Options of `zonalMeanField()`: a longitude band, optionally limited in latitude and depth. */
export interface ZonalMeanOptions extends ReductionOptions {
  lon: [number, number];
  lat?: [number, number];
  depth?: [number, number];
}

/** A time × latitude field, e.g. for a Hovmöller diagram. */
export interface ZonalMeanField {
  start: string;
  /** Latitude centres of the rows, in storage order. */
  lat: number[];
  /** values[month][row]; null where the row had no value in the band that month. */
  values: (number | null)[][];
  units: string | null;
  provenance: ReductionProvenance;
}

/**
 * Zonal mean over a longitude band for each month and latitude row: within a row, cells are
 * weighted by the area of their part inside the band (for spherical cells, proportional to the
 * longitude overlap; with cell_measures, the file's areas), and by layer thickness when a depth
 * range is averaged. Missing cells are skipped and weights renormalised per row. Streamed one
 * level of one time step at a time through the engine's `weightedSum`, like `reduceBox()`.
 */
export function zonalMeanField(file: NetcdfFile, name: string, options: ZonalMeanOptions): ZonalMeanField {
  const radius = options.radius ?? EARTH_RADIUS_GRS80_MEAN_M;
  const box: Box = { lat: options.lat ?? [-90, 90], lon: options.lon, ...(options.depth ? { depth: options.depth } : {}) };
  const { coordinates, notes } = findCoordinates(file);
  const layout = resolveGridLayout(file.variable(name), coordinates);
  const monthly = readMonthlyTime(file, layout.time.variable, { allowGaps: options.allowGaps });
  const w = gridWeights(file, layout, box, radius, options.cellMeasures ?? true, options.maxPlaneCells);
  const decoder = createCfDecoder(layout.variable);
  const plane = w.rowCount * w.nlon;
  const depth = !!layout.depth;
  const buffer = new Float64Array(plane);
  const rowSum = new Float64Array(2);
  const sums = new Float64Array(w.rowCount);
  const weights = new Float64Array(w.rowCount);
  const values: (number | null)[][] = Array.from({ length: monthly.axis.length }, () => new Array(w.rowCount).fill(null));
  const nt = layout.variable.shape[0];
  let cells = 0;
  for (let c = 0; c < plane; c++) if (w.area[c] > 0) cells++;

  for (let t = 0; t < nt; t++) {
    sums.fill(0);
    weights.fill(0);
    for (let k = 0; k < w.levelCount; k++) {
      const dz = w.thickness[k];
      if (dz === 0) continue;
      const slab = depth
        ? { start: [t, w.levelStart + k, w.rowStart, 0], count: [1, 1, w.rowCount, w.nlon] }
        : { start: [t, w.rowStart, 0], count: [1, w.rowCount, w.nlon] };
      decoder.decode(file.read(name, slab), buffer);
      for (let r = 0; r < w.rowCount; r++) {
        weightedSum(buffer, r * w.nlon, w.area, r * w.nlon, w.nlon, rowSum);
        sums[r] += rowSum[0] * dz;
        weights[r] += rowSum[1] * dz;
      }
    }
    const out = values[monthly.axis.slotOfStep[t]];
    for (let r = 0; r < w.rowCount; r++) out[r] = weights[r] > 0 ? sums[r] / weights[r] : null;
  }

  const measured = w.areaSource.startsWith('cell areas from');
  return {
    start: monthly.axis.start,
    lat: Array.from(w.latCentres),
    values,
    units: stringAttribute(layout.variable.attributes, 'units') ?? null,
    provenance: {
      variable: name,
      file: file.path.replace(/^.*[\\/]/, ''),
      format: file.format,
      method: 'zonal mean',
      box,
      radius: measured ? null : radius,
      radiusConvention: measured ? 'areas read from the file' : radiusConvention(radius),
      areaSource: w.areaSource,
      depthSource: w.depthSource,
      cells: cells * w.levelCount,
      missing: 'missing cells skipped, weights renormalised per latitude row',
      decoding: decoder.steps,
      time: `${monthly.variable} (${monthly.units}, calendar ${monthly.calendar})${monthly.fromBounds ? ', months from bounds midpoints' : ''}`,
      notes: [...file.notes, ...notes, ...w.notes],
    },
  };
}

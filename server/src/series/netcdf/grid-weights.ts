import { cellAreas } from '@upwell/common';
import { stringAttribute } from './attributes';
import { readCellEdges } from './cell-edges';
import { createCfDecoder, decodedCopy } from './cf-decoder';
import type { GridLayout } from './grid-layout';
import { longitudeOverlap } from './longitude-overlap';
import { NetcdfImportError } from './netcdf-import-error';
import { DEFAULT_NETCDF_LIMITS } from './size-limits';
import type { NetcdfFile } from './types';

/** A latitude–longitude box, degrees; longitude runs eastward from `lon[0]` to `lon[1]`. Depth in metres, positive down. */
export interface Box {
  lat: [number, number];
  lon: [number, number];
  depth?: [number, number];
}

/** Precomputed weights of the cells of a field inside a box. */
export interface GridWeights {
  /** First latitude row (storage index) with any cell in the box, and how many rows follow. */
  rowStart: number;
  rowCount: number;
  nlon: number;
  /** Latitude centres of those rows. */
  latCentres: Float64Array;
  /** Area (m²) of each cell's part inside the box, row-major (rowCount × nlon); 0 outside. */
  area: Float64Array;
  /** First depth level inside the depth range, how many, and the thickness (m) of each inside it. */
  levelStart: number;
  levelCount: number;
  thickness: Float64Array;
  /** Where cell areas came from, for provenance. */
  areaSource: string;
  depthSource: string | null;
  notes: string[];
}

/**
 * Weights for area- (and thickness-) weighted reductions of a field over a box. Cells partly in
 * the box count with the part inside: on a sphere the area between two parallels and two
 * meridians is R²·Δλ·|sin φ2 − sin φ1| (the engine's `cellAreas`), so the clipped cell keeps that
 * form with clipped edges. When the variable's `cell_measures` names an area variable present in
 * the file (CF 1.11 §7.2), its areas are used, times the fraction of the cell inside the box.
 */
export function gridWeights(file: NetcdfFile, layout: GridLayout, box: Box, radius: number, useCellMeasures = true, maxPlaneCells = DEFAULT_NETCDF_LIMITS.maxReadCells): GridWeights {
  checkBox(box, layout);
  const notes: string[] = [];
  const lat = readCellEdges(file, layout.lat);
  const lon = readCellEdges(file, layout.lon);
  const south = Math.min(box.lat[0], box.lat[1]);
  const north = Math.max(box.lat[0], box.lat[1]);
  const nlat = lat.lo.length;
  const nlon = lon.lo.length;

  const rows: number[] = [];
  for (let j = 0; j < nlat; j++) if (Math.min(lat.hi[j], north) > Math.max(lat.lo[j], south)) rows.push(j);
  if (rows.length === 0) throw new NetcdfImportError('bad-coordinates', layout.lat.variable, `no latitude cell of ${layout.variable.name} lies in ${south}..${north}; the grid covers ${Math.min(...lat.lo)}..${Math.max(...lat.hi)}`);
  const rowStart = rows[0];
  const rowCount = rows[rows.length - 1] - rowStart + 1;
  // Checked before anything of the box's size is allocated: weights and one plane of values are held at once.
  if (rowCount * nlon > maxPlaneCells) {
    throw new NetcdfImportError('too-large', layout.variable.name, `the box covers ${rowCount} latitude rows × ${nlon} longitudes = ${rowCount * nlon} cells of ${layout.variable.name} per level, more than the ${maxPlaneCells} this server holds at once (NETCDF_MAX_READ_CELLS); choose a smaller latitude range`);
  }

  const overlapDeg = new Float64Array(nlon);
  const widthDeg = new Float64Array(nlon);
  for (let i = 0; i < nlon; i++) {
    overlapDeg[i] = longitudeOverlap(lon.lo[i], lon.hi[i], box.lon[0], box.lon[1]);
    widthDeg[i] = lon.hi[i] - lon.lo[i];
  }
  if (!overlapDeg.some((x) => x > 0)) throw new NetcdfImportError('bad-coordinates', layout.lon.variable, `no longitude cell of ${layout.variable.name} lies in ${box.lon[0]}..${box.lon[1]}`);

  const measured = useCellMeasures ? cellMeasureAreas(file, layout, notes) : null;
  const area = new Float64Array(rowCount * nlon);
  const latCentres = new Float64Array(rowCount);
  for (let r = 0; r < rowCount; r++) {
    const j = rowStart + r;
    latCentres[r] = lat.centres[j];
    const lo = Math.max(lat.lo[j], south);
    const hi = Math.min(lat.hi[j], north);
    // Area of a one-degree-wide strip of this row, clipped to the box and whole.
    const strip = hi > lo ? cellAreas([lo, hi], [0, 1], radius)[0] : 0;
    const wholeStrip = cellAreas([lat.lo[j], lat.hi[j]], [0, 1], radius)[0];
    for (let i = 0; i < nlon; i++) {
      if (overlapDeg[i] === 0 || strip === 0) continue;
      area[r * nlon + i] = measured
        ? measured.values[j * nlon + i] * (strip / wholeStrip) * (overlapDeg[i] / widthDeg[i])
        : strip * overlapDeg[i];
    }
  }

  let levelStart = 0;
  let levelCount = 1;
  let thickness = Float64Array.of(1);
  let depthSource: string | null = null;
  if (layout.depth) {
    const depth = readCellEdges(file, layout.depth);
    const top = box.depth ? Math.min(...box.depth) : Number.NEGATIVE_INFINITY;
    const bottom = box.depth ? Math.max(...box.depth) : Number.POSITIVE_INFINITY;
    const levels: number[] = [];
    for (let k = 0; k < depth.lo.length; k++) if (Math.min(depth.hi[k], bottom) > Math.max(depth.lo[k], top)) levels.push(k);
    if (levels.length === 0) throw new NetcdfImportError('bad-coordinates', layout.depth.variable, `no depth level of ${layout.variable.name} lies in ${top}..${bottom} m; levels span ${Math.min(...depth.lo)}..${Math.max(...depth.hi)} m`);
    levelStart = levels[0];
    levelCount = levels[levels.length - 1] - levelStart + 1;
    thickness = new Float64Array(levelCount);
    for (let k = 0; k < levelCount; k++) {
      const kk = levelStart + k;
      thickness[k] = Math.max(0, Math.min(depth.hi[kk], bottom) - Math.max(depth.lo[kk], top));
    }
    depthSource = `layer thickness from ${depth.source === 'bounds' ? `${layout.depth.variable}'s bounds` : `midpoints between ${layout.depth.variable} levels`}`;
  }
  const areaSource = measured
    ? `cell areas from ${measured.name} (cell_measures), times the fraction of each cell inside the box`
    : `sphere of radius ${radius} m, cell edges from ${lat.source === 'bounds' ? 'bounds variables' : 'midpoints between centres'} (latitude) and ${lon.source === 'bounds' ? 'bounds variables' : 'midpoints between centres'} (longitude)`;
  return { rowStart, rowCount, nlon, latCentres, area, levelStart, levelCount, thickness, areaSource, depthSource, notes };
}

function checkBox(box: Box, layout: GridLayout): void {
  const [s, n] = box.lat;
  if (![s, n, ...box.lon].every(Number.isFinite) || Math.min(s, n) < -90 || Math.max(s, n) > 90 || s === n) {
    throw new NetcdfImportError('bad-coordinates', 'box', `box latitudes ${s}..${n} must be two different values within −90..90`);
  }
  if (box.depth && !layout.depth) {
    throw new NetcdfImportError('bad-coordinates', 'box', `a depth range was given but ${layout.variable.name} has no depth dimension`);
  }
  if (box.depth && (!box.depth.every(Number.isFinite) || box.depth[0] === box.depth[1])) {
    throw new NetcdfImportError('bad-coordinates', 'box', `depth range ${box.depth[0]}..${box.depth[1]} must be two different numbers of metres`);
  }
}

// CF 1.11 §7.2: cell_measures = "area: <variable>"; the variable may live in another file
// (external_variables), in which case areas fall back to the sphere.
function cellMeasureAreas(file: NetcdfFile, layout: GridLayout, notes: string[]): { name: string; values: Float64Array } | null {
  const measures = stringAttribute(layout.variable.attributes, 'cell_measures');
  const name = measures && /area:\s*(\S+)/.exec(measures)?.[1];
  if (!name) return null;
  const v = file.variables.find((x) => x.name === name);
  if (!v) {
    notes.push(`cell_measures names ${name}, which is not in this file; cell areas computed on the sphere instead`);
    return null;
  }
  if (v.dims.length !== 2 || v.dims[0] !== layout.lat.dimension || v.dims[1] !== layout.lon.dimension) {
    notes.push(`cell area variable ${name} has dimensions (${v.dims.join(', ')}), not (${layout.lat.dimension}, ${layout.lon.dimension}); cell areas computed on the sphere instead`);
    return null;
  }
  const { values, missing } = decodedCopy(file.read(name), createCfDecoder(v));
  // A missing area (e.g. land in an ocean grid) gives the cell no weight.
  if (missing > 0) for (let k = 0; k < values.length; k++) if (values[k] !== values[k]) values[k] = 0;
  return { name, values };
}

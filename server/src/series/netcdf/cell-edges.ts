import { edgesFromCentres } from '@upwell/common';
import { stringAttribute } from './attributes';
import { createCfDecoder, decodedCopy } from './cf-decoder';
import type { Coordinate } from './coordinates';
import { NetcdfImportError } from './netcdf-import-error';
import type { NetcdfFile } from './types';

/** Lower and upper edge of each cell along one axis, in the coordinate's units (depth: metres, positive down). */
export interface CellEdges {
  lo: Float64Array;
  hi: Float64Array;
  centres: Float64Array;
  /** 'bounds' when read from the coordinate's `bounds` variable (CF 1.11 §7.1), else 'midpoints'. */
  source: 'bounds' | 'midpoints';
}

// Depth units accepted for thickness weighting, as metres per unit (SI prefixes).
const METRES: Record<string, number> = { m: 1, meter: 1, meters: 1, metre: 1, metres: 1, cm: 0.01, km: 1000 };

/**
 * Cell edges of a latitude, longitude or depth coordinate: from its `bounds` variable when
 * present, else midway between neighbouring centres (the engine's `edgesFromCentres`), latitude
 * clamped to ±90° and depth to the surface. Depth with `positive = "up"` (CF 1.11 §4.3) is turned
 * into depth below the surface, and converted to metres.
 */
export function readCellEdges(file: NetcdfFile, coordinate: Coordinate): CellEdges {
  const v = file.variable(coordinate.variable);
  let centres = decodedCopy(file.read(v.name), createCfDecoder(v)).values;
  const n = centres.length;
  let lo = new Float64Array(n);
  let hi = new Float64Array(n);
  let source: CellEdges['source'] = 'midpoints';
  const boundsName = stringAttribute(v.attributes, 'bounds');
  const bounds = boundsName ? file.variables.find((b) => b.name === boundsName) : undefined;
  if (bounds && bounds.shape.length === 2 && bounds.shape[0] === n && bounds.shape[1] === 2) {
    const b = decodedCopy(file.read(bounds.name), createCfDecoder(bounds)).values;
    for (let i = 0; i < n; i++) {
      lo[i] = Math.min(b[2 * i], b[2 * i + 1]);
      hi[i] = Math.max(b[2 * i], b[2 * i + 1]);
    }
    source = 'bounds';
  } else {
    if (n < 2) {
      throw new NetcdfImportError('bad-coordinates', coordinate.variable, `${coordinate.variable} has a single value and no bounds variable, so the size of its cells is unknown; add ${coordinate.variable}:bounds`);
    }
    const edges = edgesFromCentres(centres, coordinate.role === 'latitude');
    for (let i = 0; i < n; i++) {
      lo[i] = Math.min(edges[i], edges[i + 1]);
      hi[i] = Math.max(edges[i], edges[i + 1]);
    }
  }
  if (!centres.every(Number.isFinite) || !lo.every(Number.isFinite) || !hi.every(Number.isFinite)) {
    throw new NetcdfImportError('bad-coordinates', coordinate.variable, `${coordinate.variable} (or its bounds) has missing values; coordinates must all be present`);
  }
  if (coordinate.role === 'depth') {
    const units = (stringAttribute(v.attributes, 'units') ?? 'm').toLowerCase();
    const perUnit = METRES[units];
    if (perUnit === undefined) {
      throw new NetcdfImportError('bad-coordinates', `${coordinate.variable}:units`, `depth coordinate ${coordinate.variable} has units "${units}"; thickness weighting needs a length (m, cm, km)`);
    }
    const up = stringAttribute(v.attributes, 'positive')?.toLowerCase() === 'up';
    const sign = up ? -perUnit : perUnit;
    const [l, h] = [lo.map((x) => x * sign), hi.map((x) => x * sign)];
    lo = up ? h : l;
    hi = up ? l : h;
    centres = centres.map((x) => x * sign);
    if (source === 'midpoints') for (let i = 0; i < n; i++) lo[i] = Math.max(lo[i], Math.min(0, centres[i]));
  }
  return { lo, hi, centres, source };
}

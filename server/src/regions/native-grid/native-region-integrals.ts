import { regionIntegral, thicknessWithinDepth, volumeIntegral } from '@upwell/common';
import { createCfDecoder } from '../../series/netcdf/cf-decoder';
import { NetcdfImportError } from '../../series/netcdf/netcdf-import-error';
import type { NetcdfFile } from '../../series/netcdf/types';
import type { NativeHorizontalGrid } from './native-horizontal-grid';
import type { NativeThickness } from './native-thickness';

/** A region given by one mask value per horizontal cell. */
export interface CellRegion {
  name: string;
  mask: Uint8Array;
}

/** One region × depth range integral through time. */
export interface RegionSeries {
  region: string;
  /** Upper-ocean limit in m, or null for full depth (and for 2-D variables). */
  depthLimit: number | null;
  /** Σ over cells per time step (area integral for (time, y, x), volume integral for (time, level, y, x)); NaN when no cell had a value. */
  values: Float64Array;
  /** Area (m²) or volume (m³) the integral covered at the first time step. */
  measure: number;
}

/**
 * Integrates a (time, y, x) or (time, level, y, x) variable over every region and depth range, one
 * time step in memory at a time (bounded by one 3-D slice in float64, not the file). Depth limits
 * are clipped per cell (thicknessWithinDepth); null means every wet cell. The variable's own
 * units times m² or m³ are the result's units (e.g. mol m-3 s-1 → mol s-1).
 */
export function integrateNativeRegions(
  file: NetcdfFile,
  variableName: string,
  grid: NativeHorizontalGrid,
  thickness: NativeThickness | null,
  regions: readonly CellRegion[],
  depthLimits: readonly (number | null)[],
): RegionSeries[] {
  const v = file.variable(variableName);
  const cells = grid.shape[0] * grid.shape[1];
  const threeD = v.dims.length === 4;
  if (v.dims.length !== 3 && !threeD) throw new NetcdfImportError('not-importable', v.name, `${v.name} has dimensions (${v.dims.join(', ')}); expected (time, y, x) or (time, level, y, x)`);
  if (v.dims[v.dims.length - 2] !== grid.dims[0] || v.dims[v.dims.length - 1] !== grid.dims[1]) {
    throw new NetcdfImportError('bad-coordinates', v.name, `${v.name} is on (${v.dims.slice(-2).join(', ')}), not on the grid (${grid.dims.join(', ')})`);
  }
  if (threeD && (!thickness || thickness.thickness.length !== v.shape[1] * cells)) {
    throw new NetcdfImportError('bad-coordinates', v.name, `${v.name} has ${v.shape[1]} levels but the cell thicknesses cover ${thickness ? thickness.levels : 0}`);
  }
  const steps = v.shape[0];
  const limits = threeD ? depthLimits : [null];
  const clipped = limits.map((h) => (threeD ? (h === null ? thickness!.thickness : thicknessWithinDepth(thickness!.thickness, cells, h)) : null));
  const out: RegionSeries[] = [];
  for (const r of regions) for (const h of limits) out.push({ region: r.name, depthLimit: h, values: new Float64Array(steps), measure: 0 });
  const decoder = createCfDecoder(v);
  const slab = new Float64Array(v.shape.slice(1).reduce((a, b) => a * b, 1));
  for (let t = 0; t < steps; t++) {
    const start = v.shape.map(() => 0);
    start[0] = t;
    decoder.decode(file.read(v.name, { start, count: [1, ...v.shape.slice(1)] }), slab);
    let k = 0;
    for (const r of regions) {
      for (let d = 0; d < limits.length; d++, k++) {
        const got = threeD ? volumeIntegral(slab, grid.areas, clipped[d]!, r.mask) : regionIntegral(slab, grid.areas, r.mask);
        out[k].values[t] = got ? got.integral : Number.NaN;
        if (t === 0 && got) out[k].measure = 'volume' in got ? got.volume : got.area;
      }
    }
  }
  return out;
}

import { layersFromBounds, partialBottomThickness } from '@upwell/common';
import { stringAttribute } from '../../series/netcdf/attributes';
import { createCfDecoder, decodedCopy } from '../../series/netcdf/cf-decoder';
import { NetcdfImportError } from '../../series/netcdf/netcdf-import-error';
import type { NcVariable, NetcdfFile } from '../../series/netcdf/types';
import type { NativeHorizontalGrid } from './native-horizontal-grid';

/** Cell thicknesses of a 3-D variable on its native grid, and where they came from. */
export interface NativeThickness {
  /** The vertical dimension. */
  dim: string;
  levels: number;
  /** (level, cell) thickness in m, levels from the surface down; 0 for dry cells. */
  thickness: Float64Array;
  /** e.g. "thkcello", "volcello / areacello", "lev_bnds (centimeters) cut at deptho". */
  source: string;
}

/**
 * The thickness of every cell of `variableName` (…, level, y, x): from a cell-thickness variable
 * (`thkcello`, standard_name cell_thickness), else the volume measure divided by the area, else
 * the vertical coordinate's bounds (CF 1.11 §7.1, units m/cm, `positive` up/down) with partial
 * bottom cells cut at `deptho` when the file has it. Time-invariant measures only in this slice.
 * With none of these the read stops, saying what to add.
 */
export function readNativeThickness(file: NetcdfFile, variableName: string, grid: NativeHorizontalGrid): NativeThickness {
  const v = file.variable(variableName);
  if (v.dims.length < 3) throw new NetcdfImportError('not-importable', v.name, `${v.name} has no vertical dimension`);
  const dim = v.dims[v.dims.length - 3];
  const levels = v.shape[v.shape.length - 3];
  const cells = grid.shape[0] * grid.shape[1];
  const onCells = (name: string) => {
    const c = file.variables.find((x) => x.name === name);
    return c && c.dims.length === 3 && c.dims[0] === dim && c.dims[1] === grid.dims[0] && c.dims[2] === grid.dims[1] ? c : undefined;
  };
  const metres = (name: string) => {
    const u = (stringAttribute(file.variable(name).attributes, 'units') ?? '').toLowerCase();
    if (u === 'm' || u === 'meters' || u === 'metres') return 1;
    if (u === 'cm' || u === 'centimeters' || u === 'centimetres') return 0.01;
    throw new NetcdfImportError('bad-coordinates', `${name}:units`, `cell thickness ${name} has units "${u}", expected m or cm`);
  };
  const read = (name: string) => decodedCopy(file.read(name), createCfDecoder(file.variable(name))).values;

  const isThickness = (x: NcVariable) => stringAttribute(x.attributes, 'standard_name') === 'cell_thickness' || x.name === 'thkcello';
  // A thickness that changes in time (z* or layered models) must not be replaced by static bounds without a word.
  const moving = file.variables.find((x) => isThickness(x) && x.dims.length === 4 && x.dims[1] === dim);
  if (moving) throw new NetcdfImportError('unsupported', moving.name, `${moving.name} varies in time (${moving.dims.join(', ')}); time-varying cell thickness is not read yet: give a time-invariant thkcello (lev, y, x) or the time-mean thickness`);
  const thk = file.variables.find((x) => onCells(x.name) && isThickness(x));
  if (thk) {
    const f = metres(thk.name);
    return { dim, levels, thickness: read(thk.name).map((h) => (h > 0 ? h * f : 0)), source: thk.name };
  }
  const vol = grid.volumeVariable ? onCells(grid.volumeVariable) : undefined;
  if (vol) {
    const values = read(vol.name);
    const thickness = new Float64Array(values.length);
    for (let i = 0; i < values.length; i++) {
      const a = grid.areas[i % cells];
      thickness[i] = values[i] > 0 && a > 0 ? values[i] / a : 0;
    }
    return { dim, levels, thickness, source: `${vol.name} / ${grid.areaVariable}` };
  }
  const coord = file.variables.find((x) => x.name === dim && x.dims.length === 1);
  const boundsName = coord && stringAttribute(coord.attributes, 'bounds');
  const bounds = boundsName ? file.variables.find((x) => x.name === boundsName) : undefined;
  if (!coord || !bounds) {
    throw new NetcdfImportError('bad-coordinates', coord ? `${coord.name}:bounds` : dim, `the vertical axis ${dim} of ${v.name} has no bounds (CF 1.11 §7.1) and the file has no cell thickness (thkcello) or volume (volcello); add ${dim}_bnds or thkcello so layer thicknesses are known`);
  }
  const positive = stringAttribute(coord.attributes, 'positive')?.toLowerCase() === 'up' ? 'up' : 'down';
  let layers;
  try {
    layers = layersFromBounds(read(bounds.name), stringAttribute(bounds.attributes, 'units') ?? stringAttribute(coord.attributes, 'units'), positive);
  } catch (e) {
    throw new NetcdfImportError('bad-coordinates', bounds.name, `${bounds.name}: ${(e as Error).message}`);
  }
  const deptho = file.variables.find((x) => x.name === 'deptho' && x.dims.length === 2 && x.dims[0] === grid.dims[0] && x.dims[1] === grid.dims[1]);
  const floor = deptho ? read(deptho.name) : new Float64Array(cells).fill(Number.POSITIVE_INFINITY);
  return {
    dim,
    levels,
    thickness: partialBottomThickness(layers.top, layers.bottom, floor),
    source: `${bounds.name} (${stringAttribute(bounds.attributes, 'units') ?? 'm'}, positive ${positive})${deptho ? ' cut at deptho' : ''}`,
  };
}

import { NetcdfImportError } from './netcdf-import-error';
import type { Hyperslab, NetcdfFile, NumericArray } from './types';

/** How much a NetCDF file may declare and how much one read may bring into memory. */
export interface NetcdfLimits {
  /** Most cells one variable may declare (all dimensions multiplied); NETCDF_MAX_CELLS. */
  maxCells: number;
  /** Most cells one read may return, e.g. one time step (one level) of a box; NETCDF_MAX_READ_CELLS. */
  maxReadCells: number;
}

/** 2^32 cells per variable; 2^23 cells (8 Mi, a 0.1° global plane fits) per read. */
export const DEFAULT_NETCDF_LIMITS: NetcdfLimits = { maxCells: 2 ** 32, maxReadCells: 2 ** 23 };

/**
 * Deflate cannot shrink data more than about 1032:1 (zlib technical details, "Maximum compression
 * factor"), so a compressed variable declaring more than 1032 times the file's bytes has no real data.
 */
export const DEFLATE_MAX_RATIO = 1032;

/** Cells of a shape (1 for a scalar). */
export function cellCount(shape: readonly number[]): number {
  let n = 1;
  for (const s of shape) n *= s;
  return n;
}

/** Throws 'too-large' naming the first variable that declares more cells than the limit. */
export function assertCellLimit(file: NetcdfFile, limits: NetcdfLimits): void {
  for (const v of file.variables) {
    const cells = cellCount(v.shape);
    if (cells > limits.maxCells) {
      throw new NetcdfImportError(
        'too-large',
        v.name,
        `variable ${v.name} (${v.dims.map((d, i) => `${d}=${v.shape[i]}`).join(', ')}) declares ${cells.toExponential(3)} cells, more than the ${limits.maxCells} this server reads per variable (NETCDF_MAX_CELLS)`,
      );
    }
  }
}

/**
 * The file with every read refused before allocation when it would return more than
 * `maxReadCells` values, so no declared size can make one read allocate gigabytes.
 */
export function withReadLimit(file: NetcdfFile, limits: NetcdfLimits): NetcdfFile {
  const read = (name: string, slab?: Hyperslab): NumericArray => {
    const v = file.variable(name);
    const cells = cellCount(slab ? slab.count : v.shape);
    if (cells > limits.maxReadCells) {
      throw new NetcdfImportError(
        'too-large',
        name,
        `reading ${name} would take ${cells} values at once, more than the ${limits.maxReadCells} this server reads in one piece (NETCDF_MAX_READ_CELLS); choose a smaller box or ask the administrator to raise the limit`,
      );
    }
    return file.read(name, slab);
  };
  return { ...file, read };
}

import { closeSync, fstatSync, openSync, readSync } from 'node:fs';
import { resolve } from 'node:path';
import { openClassicFile } from './classic-file';
import { assertHdf5Complete } from './hdf5-end-of-file';
import { openHdf5File } from './hdf5-file';
import { NetcdfImportError } from './netcdf-import-error';
import { assertCellLimit, DEFAULT_NETCDF_LIMITS, withReadLimit, type NetcdfLimits } from './size-limits';
import type { NetcdfFile } from './types';

/** Options for `openNetcdf()`. */
export interface OpenNetcdfOptions {
  /** Cells a variable may declare and one read may return (default `DEFAULT_NETCDF_LIMITS`). */
  limits?: NetcdfLimits;
}

// Magic numbers: NetCDF format specification ("CDF" + version byte) and the HDF5 signature
// (HDF5 File Format Specification, "Format Signature"), which NetCDF-4 files start with.
const HDF5_SIGNATURE = [0x89, 0x48, 0x44, 0x46, 0x0d, 0x0a, 0x1a, 0x0a];

/**
 * Opens a NetCDF file on disk, choosing the reader by its first bytes: `CDF\x01` (classic) and
 * `CDF\x02` (64-bit offset) through netcdfjs, `\x89HDF\r\n\x1a\n` (NetCDF-4) through h5wasm.
 * Anything else — empty, too short, another format — is a `NetcdfImportError` saying what was found.
 * Call `close()` on the result when done.
 */
export async function openNetcdf(path: string, options: OpenNetcdfOptions = {}): Promise<NetcdfFile> {
  const limits = options.limits ?? DEFAULT_NETCDF_LIMITS;
  const file = await openByMagic(resolve(path));
  try {
    assertCellLimit(file, limits);
  } catch (error) {
    file.close();
    throw error;
  }
  return withReadLimit(file, limits);
}

async function openByMagic(absolute: string): Promise<NetcdfFile> {
  const fd = openSync(absolute, 'r');
  let head: Uint8Array;
  let length: number;
  try {
    length = fstatSync(fd).size;
    head = new Uint8Array(Math.min(length, 512));
    readSync(fd, head, 0, head.length, 0);
  } catch (error) {
    closeSync(fd);
    throw error;
  }
  if (head[0] === 0x43 && head[1] === 0x44 && head[2] === 0x46 && (head[3] === 1 || head[3] === 2)) {
    // Classic files are read by byte ranges through this descriptor, which the file's close() releases.
    return openClassicFile(absolute, fd, length);
  }
  closeSync(fd);
  if (length === 0) throw new NetcdfImportError('not-netcdf', 'byte 0', 'the file is empty');
  if (head[0] === 0x43 && head[1] === 0x44 && head[2] === 0x46) {
    throw new NetcdfImportError('not-netcdf', 'byte 3', `the file starts with "CDF" but its version byte is ${head[3]}; expected 1 (classic) or 2 (64-bit offset). Version 5 (CDF-5) is not supported`);
  }
  if (HDF5_SIGNATURE.every((b, i) => head[i] === b)) {
    assertHdf5Complete(head, length);
    return openHdf5File(absolute, length);
  }
  const shown = Array.from(head.subarray(0, 8), (b) => (b >= 0x20 && b < 0x7f ? String.fromCharCode(b) : `\\x${b.toString(16).padStart(2, '0')}`)).join('');
  throw new NetcdfImportError('not-netcdf', 'byte 0', `not a NetCDF file: it starts with "${shown}", expected "CDF\\x01", "CDF\\x02" (NetCDF-3) or "\\x89HDF\\r\\n\\x1a\\n" (NetCDF-4)`);
}

import { NetcdfImportError } from './netcdf-import-error';

/**
 * The end-of-file address recorded in an HDF5 superblock at byte 0 (HDF5 File Format
 * Specification 3.0, §II.A "Superblock", versions 0–3), or undefined if it cannot be found.
 * Comparing it with the real file length catches truncated NetCDF-4 files before the HDF5
 * library reads garbage.
 */
export function hdf5EndOfFile(head: Uint8Array): number | undefined {
  const version = head[8];
  const view = new DataView(head.buffer, head.byteOffset, head.byteLength);
  let sizeOfOffsets: number;
  let eofAt: number;
  if (version === 0 || version === 1) {
    sizeOfOffsets = head[13];
    // sig 8, versions 5, sizes 2, reserved 1, leaf K 2, internal K 2, flags 4 (+ v1: storage K 2, reserved 2),
    // then base address, free-space address, end-of-file address.
    const addresses = version === 0 ? 24 : 28;
    eofAt = addresses + 2 * sizeOfOffsets;
  } else if (version === 2 || version === 3) {
    sizeOfOffsets = head[9];
    // sig 8, version 1, size of offsets 1, size of lengths 1, flags 1, base address, extension address, end-of-file address.
    eofAt = 12 + 2 * sizeOfOffsets;
  } else {
    return undefined;
  }
  if (sizeOfOffsets !== 8 && sizeOfOffsets !== 4) return undefined;
  if (eofAt + sizeOfOffsets > head.length) return undefined;
  const value = sizeOfOffsets === 8 ? Number(view.getBigUint64(eofAt, true)) : view.getUint32(eofAt, true);
  return value;
}

/** Throws when the superblock says the file is longer than it is. */
export function assertHdf5Complete(head: Uint8Array, fileLength: number): void {
  const eof = hdf5EndOfFile(head);
  if (eof !== undefined && eof > fileLength) {
    throw new NetcdfImportError('truncated', `byte ${fileLength}`, `the NetCDF-4 (HDF5) file is truncated: its superblock says it ends at byte ${eof}, but it has ${fileLength} bytes`);
  }
}

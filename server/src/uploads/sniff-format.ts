import { open } from 'node:fs/promises';
import type { UploadFormat } from './uploaded-file.entity';

/**
 * Tells a file's format by its first bytes, never by its name: NetCDF classic
 * and 64-bit offset start "CDF\x01" / "CDF\x02" (NetCDF Users Guide, file
 * format spec); NetCDF-4 is HDF5, whose signature is \x89HDF\r\n\x1a\n (HDF5
 * File Format Specification, superblock). Anything else that is text is read
 * as CSV; binary that is neither is refused.
 */
export async function sniffFormat(path: string): Promise<UploadFormat | null> {
  const handle = await open(path, 'r');
  try {
    const head = Buffer.alloc(512);
    const { bytesRead } = await handle.read(head, 0, head.length, 0);
    const b = head.subarray(0, bytesRead);
    if (b.length >= 4 && b.toString('latin1', 0, 3) === 'CDF' && (b[3] === 1 || b[3] === 2 || b[3] === 5)) return 'netcdf-classic';
    if (b.length >= 8 && b.subarray(0, 8).equals(Buffer.from([0x89, 0x48, 0x44, 0x46, 0x0d, 0x0a, 0x1a, 0x0a]))) return 'netcdf4';
    // Text: no NUL bytes in the first block (UTF-8 and single-byte encodings have none).
    return b.includes(0) ? null : 'csv';
  } finally {
    await handle.close();
  }
}

/**
 * A file name as shown to people: no folders, no control characters, no
 * bidirectional overrides or isolates (which can make "gpj.exe" read as
 * "exe.jpg", Unicode TR #9 / CVE-2021-42574 "Trojan Source"), at most 255 characters.
 */
export function cleanFileName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? '';
  const clean = base.replace(/[\u0000-\u001f\u007f\u200e\u200f\u202a-\u202e\u2066-\u2069]/g, '').trim().slice(0, 255);
  return clean && clean !== '.' && clean !== '..' ? clean : 'upload';
}

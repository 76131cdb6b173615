import { createHash } from 'node:crypto';
import { isPresent } from '@upwell/common';

/**
 * Stored form of a version's values: Float64 little-endian, one per month,
 * with the canonical quiet NaN (0x7FF8000000000000) for a missing month (the engine's isPresent rule), so
 * that the same values always give the same bytes and the same sha256.
 */
export function encodeValues(values: ReadonlyArray<number | null>): Buffer {
  const buf = Buffer.alloc(values.length * 8);
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (!isPresent(v)) buf.writeUInt32LE(0, i * 8), buf.writeUInt32LE(0x7ff80000, i * 8 + 4);
    else buf.writeDoubleLE(v === 0 ? 0 : v, i * 8); // -0 stored as 0: the same month value either way
  }
  return buf;
}

/** The values back from their stored bytes, with null for a missing month. */
export function decodeValues(buf: Buffer): (number | null)[] {
  const out = new Array<number | null>(buf.length / 8);
  for (let i = 0; i < out.length; i++) {
    const v = buf.readDoubleLE(i * 8);
    out[i] = isPresent(v) ? v : null;
  }
  return out;
}

/** sha256 (hex) of the stored bytes. */
export function valuesSha256(encoded: Buffer): string {
  return createHash('sha256').update(encoded).digest('hex');
}

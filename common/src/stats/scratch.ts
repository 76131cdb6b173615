/**
 * Reusable work buffers for hot paths. Allocating a Float64Array costs V8 about as much as filling
 * a few thousand values (backing-store setup and zeroing), which dominated the 1,000-series bench;
 * a view on a buffer kept between calls costs ~1/40 of that. A slot belongs to one call site, its
 * contents never escape the function that uses it, and the engine is single-threaded per realm,
 * so reuse cannot leak data between calls. Contents are not zeroed: callers write before reading.
 */
export interface ScratchSlot {
  buffer: Float64Array;
}

/** A new, empty slot for one call site (create it once, at module level). */
export function scratchSlot(): ScratchSlot {
  return { buffer: new Float64Array(0) };
}

/** A view of `n` doubles in the slot, growing its buffer (to at least double) when too small. */
export function scratchFloat64(slot: ScratchSlot, n: number, offset = 0): Float64Array {
  if (slot.buffer.length < offset + n) slot.buffer = new Float64Array(Math.max(offset + n, 2 * slot.buffer.length));
  return slot.buffer.subarray(offset, offset + n);
}

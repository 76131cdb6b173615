/** One region read from an integer mask variable. */
export interface FlagRegion {
  /** The region's name from `flag_meanings` (underscores as written). */
  name: string;
  /** Its code in `flag_values`. */
  code: number;
  /** 1 for each cell holding the code. */
  mask: Uint8Array;
  /** How many cells hold it. */
  cells: number;
}

/**
 * Splits an integer region mask into one mask per region, by CF flags (CF 1.11 §3.5:
 * `flag_values` lists the codes, `flag_meanings` one blank-separated word per code, in the same
 * order). Cells with NaN or a code not listed belong to no region. Throws RangeError when the two
 * attributes disagree in length or a region has no cell, naming it — an empty region would give a
 * budget of nothing that looks like a budget of zero.
 */
export function regionsFromFlags(codes: ArrayLike<number>, flagValues: readonly number[], flagMeanings: string): FlagRegion[] {
  const names = flagMeanings.trim().split(/\s+/).filter((s) => s !== '');
  if (names.length !== flagValues.length) {
    throw new RangeError(`flag_values has ${flagValues.length} codes but flag_meanings names ${names.length} regions`);
  }
  const regions = flagValues.map((code, i) => ({ name: names[i], code, mask: new Uint8Array(codes.length), cells: 0 }));
  const byCode = new Map(regions.map((r) => [r.code, r]));
  for (let c = 0; c < codes.length; c++) {
    const r = byCode.get(codes[c]);
    if (!r) continue;
    r.mask[c] = 1;
    r.cells++;
  }
  const empty = regions.filter((r) => r.cells === 0);
  if (empty.length > 0) throw new RangeError(`region ${empty.map((r) => `"${r.name}" (code ${r.code})`).join(', ')} has no cell in the mask`);
  return regions;
}

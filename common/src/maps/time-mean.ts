/** A per-cell mean being built from time slices. */
export interface TimeMeanAccumulator {
  add(slice: ArrayLike<number>): void;
  /** Mean per cell (NaN where fewer than `minCount` values were present) and the count of values. */
  finish(minCount?: number): { values: Float64Array; count: Uint16Array };
}

/**
 * Time mean of each cell of a field, fed one slice at a time (float64 sums of float32 or float64
 * inputs). Missing: non-finite values and cells with mask[c] ≠ 0. State: one sum and one count
 * per cell, so a 0.25° field of any length needs about 10 MB.
 */
export function timeMean(cells: number, mask?: ArrayLike<number>): TimeMeanAccumulator {
  const sum = new Float64Array(cells);
  const count = new Uint16Array(cells);
  return {
    add(slice) {
      for (let c = 0; c < cells; c++) {
        const v = slice[c];
        if (v - v === 0 && !(mask && mask[c])) {
          sum[c] += v;
          count[c]++;
        }
      }
    },
    finish(minCount = 1) {
      const values = new Float64Array(cells);
      for (let c = 0; c < cells; c++) values[c] = count[c] >= Math.max(1, minCount) ? sum[c] / count[c] : NaN;
      return { values, count };
    },
  };
}

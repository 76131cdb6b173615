import { MONTH_NAMES } from '../series/month';

/** A per-cell monthly-mean climatology being built from base-period slices. */
export interface CellClimatologyAccumulator {
  /** Adds the slice of month `month` (months since 0000-01); months outside the base period are ignored. */
  add(slice: ArrayLike<number>, month: number): void;
  /** The climatology, 12 × cells (January's cells first), NaN where a cell fails the minimum-years rule. */
  finish(minYears?: number): { climatology: Float64Array; warnings: string[] };
}

/**
 * Monthly-mean climatology of every cell of a field over the base period [baseFrom, baseTo]
 * (months since 0000-01, inclusive), fed one time slice at a time: the series rule per cell
 * (series/climatology-monthly.ts). A calendar month of a cell needs valid values in at least
 * `minYears` of the base period's years of that month, by default 80 % rounded up (WMO
 * Guidelines on the Calculation of Climate Normals, WMO-No. 1203, 2017); base-period months the
 * field does not hold count as years without values. Missing: non-finite values and cells with
 * mask[c] ≠ 0. State: 12 sums (float64) and 12 counts per cell.
 */
export function cellClimatology(cells: number, baseFrom: number, baseTo: number, mask?: ArrayLike<number>): CellClimatologyAccumulator {
  const sum = new Float64Array(12 * cells);
  const count = new Uint16Array(12 * cells);
  return {
    add(slice, month) {
      if (month < baseFrom || month > baseTo) return;
      const off = (month % 12) * cells;
      for (let c = 0; c < cells; c++) {
        const v = slice[c];
        // Float32 inputs summed in float64: 30 values lose nothing the data can show.
        if (v - v === 0 && !(mask && mask[c])) {
          sum[off + c] += v;
          count[off + c]++;
        }
      }
    },
    finish(minYears) {
      const warnings: string[] = [];
      const years = baseOccurrences(baseFrom, baseTo);
      const climatology = new Float64Array(12 * cells).fill(NaN);
      for (let m = 0; m < 12; m++) {
        const need = Math.max(1, minYears ?? Math.ceil(0.8 * years[m]));
        let failing = 0;
        let anyValue = 0;
        for (let c = m * cells; c < (m + 1) * cells; c++) {
          if (count[c] > 0) anyValue++;
          if (count[c] >= need) climatology[c] = sum[c] / count[c];
          else if (count[c] > 0) failing++;
        }
        if (years[m] > 0 && failing > 0) {
          warnings.push(`climatology of ${MONTH_NAMES[m]} is null at ${failing} of ${anyValue} cells with values: fewer than minYears = ${need} of ${years[m]} base-period years (WMO-No. 1203 rule for monthly normals)`);
        }
      }
      return { climatology, warnings };
    },
  };
}

/** How many times each calendar month occurs in [from, to] (months since 0000-01). */
function baseOccurrences(from: number, to: number): number[] {
  const n = to - from + 1;
  const years = new Array<number>(12).fill(Math.floor(n / 12));
  for (let k = 0; k < n % 12; k++) years[(from + k) % 12]++;
  return years;
}

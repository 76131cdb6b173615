/** Per-cell phase-randomisation p-values being built from anomaly slices. */
export interface PhaseRandomisedMapAccumulator {
  /** Adds the anomaly slice at position `step` (0-based) of the index window the surrogates were made from. */
  add(anomaly: ArrayLike<number>, step: number): void;
  /** p per cell for the observed correlations `r`; NaN where the cell's series is incomplete or r is NaN. */
  finish(r: ArrayLike<number>): Float64Array;
}

/**
 * Phase-randomised significance of a correlation map (Ebisuzaki, W. 1997, J. Climate 10:2147–2153):
 * the same `surrogates` of the index window (zero-mean, the index's amplitude spectrum, random
 * phases; stats/ebisuzaki.ts `ebisuzakiSurrogate`) are correlated with every cell, and p is the
 * share with |r_s| ≥ |r|. Because each surrogate sums to zero, Σ s·(b − b̄) = Σ s·b, so a cell
 * needs one running sum per surrogate: memory is surrogates × cells doubles. Like the series test
 * it needs a complete series: a cell with any missing month in the window gets NaN.
 */
export function phaseRandomisedMap(cells: number, surrogates: readonly Float64Array[]): PhaseRandomisedMapAccumulator {
  const count = surrogates.length;
  const cross = new Float64Array(count * cells);
  const sum = new Float64Array(cells);
  const sumSq = new Float64Array(cells);
  const shift = new Float64Array(cells).fill(NaN);
  const present = new Uint16Array(cells);
  const b = new Float64Array(cells);
  const ss = surrogates.map((s) => s.reduce((acc, v) => acc + v * v, 0));
  let steps = 0;
  return {
    add(anomaly, step) {
      steps++;
      for (let c = 0; c < cells; c++) {
        const v = anomaly[c];
        if (v - v === 0) {
          if (shift[c] !== shift[c]) shift[c] = v;
          const d = v - shift[c];
          b[c] = v;
          sum[c] += d;
          sumSq[c] += d * d;
          present[c]++;
        } else b[c] = 0;
      }
      for (let k = 0; k < count; k++) {
        const w = surrogates[k][step];
        const off = k * cells;
        for (let c = 0; c < cells; c++) cross[off + c] += w * b[c];
      }
    },
    finish(r) {
      const p = new Float64Array(cells).fill(NaN);
      for (let c = 0; c < cells; c++) {
        const n = present[c];
        const syy = sumSq[c] - (sum[c] * sum[c]) / n;
        if (n !== steps || n < 3 || !(syy > 0) || r[c] !== r[c]) continue;
        const target = Math.abs(r[c]);
        let extreme = 0;
        for (let k = 0; k < count; k++) if (ss[k] > 0 && Math.abs(cross[k * cells + c]) / Math.sqrt(ss[k] * syy) >= target) extreme++;
        p[c] = extreme / count;
      }
      return p;
    },
  };
}

import { correlationPValue } from '../stats/correlation-p-value';
import { effectiveSampleSize } from '../stats/effective-sample-size';

/** A per-cell correlation and regression on an index being built from anomaly slices. */
export interface CorrelationMapAccumulator {
  /**
   * Adds the field's anomaly slice of month `month` (months since 0000-01, increasing) paired with
   * the index anomaly `index` (NaN when missing). A month skipped since the last call breaks the
   * lag-1 neighbourhood, as a missing value does.
   */
  add(anomaly: ArrayLike<number>, index: number, month: number): void;
  finish(): CorrelationMap;
}

/** Per cell, NaN where undefined. */
export interface CorrelationMap {
  r: Float64Array;
  /** Least-squares slope of the cell's anomaly on the index anomaly: field units per index unit. */
  slope: Float64Array;
  n: Uint16Array;
  nEff: Float64Array;
  /** Two-sided p of r (and of the slope) with nEff − 2 degrees of freedom. */
  p: Float64Array;
}

const STATS = 13;
// Offsets of each cell's sums: pairs, Σa, Σb, Σa², Σb², Σab, adjacent pairs, Σa_{t−1}a_t, Σb_{t−1}b_t, and the lead/trail sums.
const N = 0, SA = 1, SB = 2, SAA = 3, SBB = 4, SAB = 5, M = 6, PA1 = 7, PB1 = 8, LEAD_A = 9, TRAIL_A = 10, LEAD_B = 11, TRAIL_B = 12;

/**
 * Correlation map and regression map of a field on an index, the series rule per cell
 * (stats/lag-window-stats.ts): pairs where both are present; r1 of each member over the paired
 * values with products only where consecutive months are both paired (NIST StRD form); nEff by
 * Bretherton, Widmann, Dymnikov, Wallace & Bladé (1999), J. Climate 12:1990–2009, clamped to
 * [3, n]; p from t = r√((nEff−2)/(1−r²)). One-pass sums about a per-cell shift (its first value)
 * keep the cancellation of Σb² − (Σb)²/n small (Chan, Golub & LeVeque 1983, Am. Stat. 37:242–247).
 * State: 13 float64 sums per cell plus the previous slice.
 */
export function correlationMap(cells: number, indexShift = 0): CorrelationMapAccumulator {
  const s = new Float64Array(STATS * cells);
  const prev = new Float64Array(cells).fill(NaN);
  const shift = new Float64Array(cells).fill(NaN);
  let prevIndex = NaN;
  let lastMonth = Number.NEGATIVE_INFINITY;
  return {
    add(anomaly, index, month) {
      const a = index - indexShift;
      const pa = month === lastMonth + 1 ? prevIndex : NaN;
      lastMonth = month;
      prevIndex = a;
      for (let c = 0; c < cells; c++) {
        const raw = anomaly[c];
        let b = NaN;
        if (raw - raw === 0 && a === a) {
          if (shift[c] !== shift[c]) shift[c] = raw;
          b = raw - shift[c];
          const o = c * STATS;
          s[o + N]++;
          s[o + SA] += a; s[o + SB] += b; s[o + SAA] += a * a; s[o + SBB] += b * b; s[o + SAB] += a * b;
          const pb = prev[c];
          if (pb === pb && pa === pa) {
            s[o + M]++;
            s[o + PA1] += pa * a; s[o + PB1] += pb * b;
            s[o + LEAD_A] += pa; s[o + TRAIL_A] += a; s[o + LEAD_B] += pb; s[o + TRAIL_B] += b;
          }
        }
        prev[c] = b;
      }
    },
    finish() {
      const out: CorrelationMap = { r: new Float64Array(cells).fill(NaN), slope: new Float64Array(cells).fill(NaN), n: new Uint16Array(cells), nEff: new Float64Array(cells).fill(NaN), p: new Float64Array(cells).fill(NaN) };
      for (let c = 0; c < cells; c++) finishCell(s, c * STATS, c, out);
      return out;
    },
  };
}

/** Turns one cell's sums into r, slope, nEff and p (as lag-window-stats' finish). */
function finishCell(s: Float64Array, o: number, c: number, out: CorrelationMap): void {
  const n = s[o + N];
  out.n[c] = n;
  if (n < 3) return;
  const ma = s[o + SA] / n;
  const mb = s[o + SB] / n;
  const sxx = s[o + SAA] - s[o + SA] * ma;
  const syy = s[o + SBB] - s[o + SB] * mb;
  const sxy = s[o + SAB] - s[o + SA] * mb;
  if (!(sxx > 1e-13 * s[o + SAA])) return;
  out.slope[c] = sxy / sxx;
  if (!(syy > 1e-13 * s[o + SBB])) return;
  const r = Math.max(-1, Math.min(1, sxy / Math.sqrt(sxx * syy)));
  out.r[c] = r;
  const m = s[o + M];
  const r1a = (s[o + PA1] - ma * (s[o + LEAD_A] + s[o + TRAIL_A]) + m * ma * ma) / sxx;
  const r1b = (s[o + PB1] - mb * (s[o + LEAD_B] + s[o + TRAIL_B]) + m * mb * mb) / syy;
  const nEff = effectiveSampleSize(n, r1a, r1b);
  if (nEff !== null) out.nEff[c] = nEff;
  const p = correlationPValue(r, nEff);
  if (p !== null) out.p[c] = p;
}

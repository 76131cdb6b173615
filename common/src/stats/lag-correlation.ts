import { parseMonth } from '../series/month';
import { toFloat64Into } from '../series/to-float64';
import type { MonthlySeries } from '../series/types';
import { correlationPValue } from './correlation-p-value';
import { effectiveSampleSize } from './effective-sample-size';
import { lagPrefixSums } from './lag-prefix-sums';
import { LAG_N, LAG_R, LAG_R1X, LAG_R1Y, lagWindowStats, lagWindowStatsComplete, lagWindowStatsFromSums } from './lag-window-stats';
import { laggedCrossProducts } from './lagged-cross-products';
import { prepareForCorrelation } from './prepare-for-correlation';
import { averageRanks } from './rank';
import { scratchFloat64, scratchSlot } from './scratch';

// Work buffers of the scan (inputs as doubles, prefix sums); nothing in them outlives a call.
const WORK = scratchSlot();

/** Body of POST /api/analysis/lag-correlation. */
export interface LagCorrelationInput {
  x: MonthlySeries;
  y: MonthlySeries;
  maxLag: number;
  method?: 'pearson' | 'spearman';
}

/** One lag of the scan; r, nEff and p are null where undefined. */
export interface LagCorrelationRow {
  lag: number;
  r: number | null;
  n: number;
  nEff: number | null;
  p: number | null;
}

/** Result of lagCorrelation(): every lag from −maxLag to +maxLag. */
export interface LagCorrelationOutput {
  lags: LagCorrelationRow[];
}

/**
 * Lagged correlation of two monthly series aligned by calendar month. At lag k, x at month t pairs
 * with y at month t+k (k > 0: x leads y). n counts pairs with both present; nEff follows
 * Bretherton et al. (1999, J. Climate 12:1990–2009) from the members' lag-1 autocorrelations over
 * the paired values; p is the two-sided t-test p-value with nEff − 2 degrees of freedom.
 * Spearman ranks the paired values of each lag (average ranks for ties) and applies the same
 * machinery, nEff included, to the ranks. A lag longer than the overlap gives n = 0 and nulls.
 */
export function lagCorrelation(req: LagCorrelationInput): LagCorrelationOutput {
  const nx = req.x.values.length;
  const ny = req.y.values.length;
  // One scratch block: x, y as doubles, then their prefix sums (4(n + 1) each).
  const work = scratchFloat64(WORK, 5 * (nx + ny) + 8);
  const xs = toFloat64Into(req.x.values, work.subarray(0, nx));
  const ys = toFloat64Into(req.y.values, work.subarray(nx, nx + ny));
  const d = parseMonth(req.y.start) - parseMonth(req.x.start);
  const spearman = req.method === 'spearman';
  // Prepared in place: the raw doubles are not needed again (Spearman ranks the raw values instead).
  const px = spearman ? xs : prepareForCorrelation(xs, xs);
  const py = spearman ? ys : prepareForCorrelation(ys, ys);
  // Gap-free windows take the prefix-sum paths (one multiply-add per pair); others the general kernel.
  const sx = lagPrefixSums(px, work.subarray(nx + ny, nx + ny + 4 * (nx + 1)));
  const sy = lagPrefixSums(py, work.subarray(nx + ny + 4 * (nx + 1), 5 * (nx + ny) + 8));
  const out = new Float64Array(4);
  // Both series gap-free (the usual case): all cross-products in one register-blocked pass.
  const gapFree = !spearman && sx.missing[nx] === 0 && sy.missing[ny] === 0;
  const cross = gapFree ? new Float64Array(2 * req.maxLag + 1) : null;
  if (cross) laggedCrossProducts(px, py, d, req.maxLag, cross);
  const lags: LagCorrelationRow[] = [];
  for (let k = -req.maxLag; k <= req.maxLag; k++) {
    // x[i] pairs with y[i + k − d]; the window is where both indices exist.
    const i0 = Math.max(0, d - k);
    const i1 = Math.min(xs.length - 1, ys.length - 1 + d - k);
    const len = i1 - i0 + 1;
    if (len <= 0) {
      lags.push({ lag: k, r: null, n: 0, nEff: null, p: null });
      continue;
    }
    const j0 = i0 + k - d;
    if (spearman) {
      const [rx, ry] = rankedWindow(xs, i0, ys, j0, len);
      lagWindowStats(rx, 0, ry, 0, len, out);
    } else if (cross) lagWindowStatsFromSums(sx, i0, sy, j0, len, cross[k + req.maxLag], out);
    else if (sx.missing[i0 + len] === sx.missing[i0] && sy.missing[j0 + len] === sy.missing[j0]) {
      lagWindowStatsComplete(px, sx, i0, py, sy, j0, len, out);
    } else lagWindowStats(px, i0, py, j0, len, out);
    lags.push(toRow(k, out));
  }
  return { lags };
}

/** Converts the kernel's slots into a response row (NaN → null). */
function toRow(lag: number, out: Float64Array): LagCorrelationRow {
  const n = out[LAG_N];
  const r = Number.isNaN(out[LAG_R]) ? null : out[LAG_R];
  if (r === null) return { lag, r: null, n, nEff: null, p: null };
  const nEff = effectiveSampleSize(n, out[LAG_R1X], out[LAG_R1Y]);
  return { lag, r, n, nEff, p: correlationPValue(r, nEff) };
}

/** Average ranks of the paired values of one lag's window, NaN where a pair is incomplete. */
function rankedWindow(x: Float64Array, xOff: number, y: Float64Array, yOff: number, len: number): [Float64Array, Float64Array] {
  const wx = new Float64Array(len);
  const wy = new Float64Array(len);
  for (let i = 0; i < len; i++) {
    const a = x[xOff + i];
    const b = y[yOff + i];
    const both = a === a && b === b;
    wx[i] = both ? a : NaN;
    wy[i] = both ? b : NaN;
  }
  return [averageRanks(wx), averageRanks(wy)];
}

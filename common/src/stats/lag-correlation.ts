import { parseMonth } from '../series/month';
import { toFloat64Into } from '../series/to-float64';
import type { MonthlySeries } from '../series/types';
import { correlationPValue } from './correlation-p-value';
import { effectiveSampleSize } from './effective-sample-size';
import { lagPrefixSums } from './lag-prefix-sums';
import { LAG_N, LAG_R, LAG_R1X, LAG_R1Y, lagWindowStats, lagWindowStatsComplete, lagWindowStatsFromSums } from './lag-window-stats';
import { laggedCrossProducts } from './lagged-cross-products';
import { lagSearchSurrogates } from './lag-search-surrogates';
import { prepareForCorrelation } from './prepare-for-correlation';
import { mulberry32 } from './prng';
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
  /** Per-lag test: t test with nEff ("ar1", default) or phase-randomised surrogates (Ebisuzaki 1997). */
  significance?: LagSignificance;
  /**
   * Number of phase-randomised surrogates; none when absent (pSearch null), so callers that do not
   * show pSearch pay nothing. POST /api/analysis/lag-correlation draws DEFAULT_SURROGATES by default.
   */
  surrogates?: number;
  /** Seed of the surrogates' PRNG (default DEFAULT_SURROGATE_SEED), so a result repeats. */
  seed?: number;
}

/** The per-lag significance tests of lagCorrelation(). */
export type LagSignificance = 'ar1' | 'phase-randomised';

/** Surrogates POST /api/analysis/lag-correlation draws when a request names no number. */
export const DEFAULT_SURROGATES = 1000;
/** Seed of the surrogate PRNG when a request names none (any fixed number; this one is the paper's year). */
export const DEFAULT_SURROGATE_SEED = 1997;
/** Share of the overlap's pairs a lag needs to be eligible as the strongest (two thirds). */
export const STRONGEST_MIN_PAIR_SHARE = 2 / 3;

/** One lag of the scan; r, nEff and p are null where undefined. */
export interface LagCorrelationRow {
  lag: number;
  r: number | null;
  n: number;
  nEff: number | null;
  p: number | null;
}

/**
 * The strongest lag: largest |r| among lags with at least two thirds of the overlap's pairs. p is the
 * pointwise p of that lag (by the chosen per-lag test); pSearch the search-corrected p (share of
 * surrogates whose max |r| over the same eligible lags reaches the observed max), null when the
 * surrogates could not be drawn (gaps inside a series, Spearman, surrogates = 0).
 */
export interface StrongestLag extends LagCorrelationRow {
  pSearch: number | null;
}

/** Result of lagCorrelation(): every lag from −maxLag to +maxLag, and the strongest (null when no r is defined). */
export interface LagCorrelationOutput {
  lags: LagCorrelationRow[];
  strongest: StrongestLag | null;
}

/**
 * Lagged correlation of two monthly series aligned by calendar month. At lag k, x at month t pairs
 * with y at month t+k (k > 0: x leads y). n counts pairs with both present; nEff follows
 * Bretherton et al. (1999, J. Climate 12:1990–2009) from the members' lag-1 autocorrelations over
 * the paired values; p is the two-sided t-test p-value with nEff − 2 degrees of freedom.
 * Spearman ranks the paired values of each lag (average ranks for ties) and applies the same
 * machinery, nEff included, to the ranks. A lag longer than the overlap gives n = 0 and nulls.
 * With significance "phase-randomised" each lag's p is instead the share of phase-randomised
 * surrogates of x whose |r| at that lag reaches the observed one (Pearson, gap-free series; null
 * otherwise). The strongest lag and its search-corrected pSearch: see StrongestLag.
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
  return { lags, strongest: strongestLag(req, lags, spearman ? null : { px, py, d }) };
}

/** Picks the strongest eligible lag and draws the surrogates for pSearch (and per-lag p when asked). */
function strongestLag(req: LagCorrelationInput, lags: LagCorrelationRow[], prepared: { px: Float64Array; py: Float64Array; d: number } | null): StrongestLag | null {
  let pairs = 0;
  for (const row of lags) if (row.n > pairs) pairs = row.n;
  const eligible = new Uint8Array(lags.length);
  const observedAbsR = new Float64Array(lags.length).fill(NaN);
  let best = -1;
  lags.forEach((row, q) => {
    if (row.r === null) return;
    observedAbsR[q] = Math.abs(row.r);
    if (row.n >= STRONGEST_MIN_PAIR_SHARE * pairs) {
      eligible[q] = 1;
      if (best < 0 || observedAbsR[q] > observedAbsR[best]) best = q;
    }
  });
  const surrogates = req.surrogates ?? 0;
  const x = prepared ? presentSpan(prepared.px) : null;
  const y = prepared ? presentSpan(prepared.py) : null;
  const search =
    prepared && x && y && surrogates > 0 && best >= 0
      ? lagSearchSurrogates({
          x: x.values,
          y: y.values,
          d: prepared.d + y.first - x.first,
          maxLag: req.maxLag,
          observedAbsR,
          eligible,
          rng: mulberry32(req.seed ?? DEFAULT_SURROGATE_SEED),
          surrogates,
        })
      : null;
  if (req.significance === 'phase-randomised') {
    lags.forEach((row, q) => {
      const p = search ? search.pLag[q] : NaN;
      row.p = Number.isNaN(p) ? null : p;
    });
  }
  return best < 0 ? null : { ...lags[best], pSearch: search ? search.pSearch : null };
}

/** The values from the first to the last present one, or null when a gap lies between (surrogates need a complete series). */
function presentSpan(x: Float64Array): { values: Float64Array; first: number } | null {
  let first = 0;
  let last = x.length - 1;
  while (first <= last && x[first] !== x[first]) first++;
  while (last >= first && x[last] !== x[last]) last--;
  if (last - first + 1 < 3) return null;
  for (let i = first; i <= last; i++) if (x[i] !== x[i]) return null;
  return { values: x.subarray(first, last + 1), first };
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

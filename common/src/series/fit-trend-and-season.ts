import { solveLinear } from '../stats/solve-linear';

/** The seasonal part of a joint fit: 12 free monthly means, or a mean plus `harmonics` sine/cosine pairs. */
export type SeasonModel = { kind: 'monthly-mean' } | { kind: 'harmonic'; harmonics: number };

/** Result of fitTrendAndSeason(): fitted value at index i = seasonal[calendar month of i] + slope·i. */
export interface TrendSeasonFit {
  /** Slope per month (per step of the index). */
  slope: number;
  /** The seasonal level of each calendar month at index 0, January first; NaN for a month without data (monthly-mean model). */
  seasonal: number[];
}

/**
 * One least-squares fit of a straight line and a seasonal cycle together (Thoning, Tans & Komhyr
 * 1989, J. Geophys. Res. 94(D6):8549–8565): y_i = s(m_i) + b·i with s either 12 free monthly means
 * (12 month dummies, no separate constant) or a mean plus harmonics. Fitting the climatology first
 * and the line afterwards lets the trend leak into the monthly means (a sawtooth across the year);
 * the joint fit leaves every calendar month's mean residual at zero (monthly-mean model). The
 * normal equations are built from per-calendar-month tallies (count, Σi, Σi², Σy, Σiy) on centred
 * i and y, so the cost is one pass. x: NaN = missing; `start` = months since 0000-01 of x[0].
 * null when no line is defined (fewer than two months of data, or i constant within every month).
 */
export function fitTrendAndSeason(x: Float64Array, start: number, model: SeasonModel): TrendSeasonFit | null {
  const c = new Float64Array(12), st = new Float64Array(12), stt = new Float64Array(12), sy = new Float64Array(12), sty = new Float64Array(12);
  let n = 0, iMean = 0, yMean = 0;
  for (let i = 0; i < x.length; i++) if (x[i] === x[i]) { n++; iMean += (i - iMean) / n; yMean += (x[i] - yMean) / n; }
  if (n < 2) return null;
  for (let i = 0, cal = start % 12; i < x.length; i++, cal = cal === 11 ? 0 : cal + 1) {
    if (x[i] !== x[i]) continue;
    const t = i - iMean;
    const y = x[i] - yMean;
    c[cal]++; st[cal] += t; stt[cal] += t * t; sy[cal] += y; sty[cal] += t * y;
  }
  const monthly = model.kind === 'monthly-mean';
  // Seasonal columns: 12 indicators, or 1, cos(2πk·m/12), sin(2πk·m/12), k = 1..H.
  const q = monthly ? 12 : 2 * model.harmonics + 1;
  const basis = (m: number, j: number): number =>
    monthly ? (m === j ? 1 : 0) : j === 0 ? 1 : (j % 2 === 1 ? Math.cos : Math.sin)((2 * Math.PI * Math.ceil(j / 2) * m) / 12);
  // Months without data drop out of the monthly model (their column would be all zeros).
  const cols = monthly ? [...Array(12).keys()].filter((m) => c[m] > 0) : [...Array(q).keys()];
  const p = cols.length + 1;
  const a = new Float64Array(p * p);
  const b = new Float64Array(p);
  for (let m = 0; m < 12; m++) {
    if (c[m] === 0) continue;
    cols.forEach((j, r) => {
      const fj = basis(m, j);
      cols.forEach((k, s) => (a[r * p + s] += fj * basis(m, k) * c[m]));
      a[r * p + p - 1] += fj * st[m];
      a[(p - 1) * p + r] += fj * st[m];
      b[r] += fj * sy[m];
    });
    a[p * p - 1] += stt[m];
    b[p - 1] += sty[m];
  }
  const beta = solveLinear(a, b, p);
  if (!beta) return null;
  const slope = beta[p - 1];
  const seasonal = new Array(12).fill(NaN);
  for (let m = 0; m < 12; m++) {
    if (monthly && c[m] === 0) continue;
    let s = 0;
    cols.forEach((j, r) => (s += basis(m, j) * beta[r]));
    // Back from centred i and y: value at index 0.
    seasonal[m] = s + yMean - slope * iMean;
  }
  return { slope, seasonal };
}

import { isPresent } from '../series/missing';
import { maxAbs, overflowSafeScale } from './scale';

/** Ordinary least-squares fit y = intercept + slope·x with standard errors. */
export interface OlsFit {
  slope: number | null;
  intercept: number | null;
  slopeStdErr: number | null;
  interceptStdErr: number | null;
  r2: number | null;
  n: number;
}

/**
 * Ordinary least squares of y on x over the pairs where both are present, in the centred form
 * slope = Σ(x−x̄)(y−ȳ)/Σ(x−x̄)², intercept = ȳ − slope·x̄ (two passes; cf. NIST StRD "Norris").
 * Standard errors from s² = SSE/(n−2): SE(slope) = √(s²/Sxx), SE(intercept) = √(s²(1/n + x̄²/Sxx))
 * (e.g. Draper & Smith, Applied Regression Analysis, ch. 1). R² = 1 − SSE/SST.
 * Undefined statistics are null: slope/intercept need n ≥ 2 and x not constant, standard errors
 * n ≥ 3, R² a non-constant y.
 */
export function ols(x: ArrayLike<number | null>, y: ArrayLike<number | null>): OlsFit {
  const len = Math.min(x.length, y.length);
  const sy = overflowSafeScale(maxAbs(y));
  let n = 0;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < len; i++) {
    const a = x[i];
    const b = y[i];
    if (!isPresent(a) || !isPresent(b)) continue;
    n++;
    mx += (a - mx) / n;
    my += (b * sy - my) / n;
  }
  const empty: OlsFit = { slope: null, intercept: null, slopeStdErr: null, interceptStdErr: null, r2: null, n };
  if (n < 2) return empty;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < len; i++) {
    const a = x[i];
    const b = y[i];
    if (!isPresent(a) || !isPresent(b)) continue;
    const dx = a - mx;
    const dy = b * sy - my;
    sxx += dx * dx;
    sxy += dx * dy;
    syy += dy * dy;
  }
  if (sxx === 0) return empty;
  const slope = sxy / sxx;
  // SSE = Syy − slope·Sxy can cancel badly for near-perfect fits (Norris: R² = 0.99999): sum residuals instead.
  let sse = 0;
  for (let i = 0; i < len; i++) {
    const a = x[i];
    const b = y[i];
    if (!isPresent(a) || !isPresent(b)) continue;
    const e = b * sy - my - slope * (a - mx);
    sse += e * e;
  }
  const s2 = n > 2 ? sse / (n - 2) : null;
  return {
    slope: slope / sy,
    intercept: (my - slope * mx) / sy,
    slopeStdErr: s2 === null ? null : Math.sqrt(s2 / sxx) / sy,
    interceptStdErr: s2 === null ? null : Math.sqrt(s2 * (1 / n + (mx * mx) / sxx)) / sy,
    r2: syy === 0 ? null : 1 - sse / syy,
    n,
  };
}

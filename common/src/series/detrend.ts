import { ols } from '../stats/ols';

/**
 * Removes the OLS line fitted over the whole series (x = month number 0, 1, 2, …) from x, in a
 * new array; NaN stays NaN. Returns the values unchanged and fitted = false when fewer than two
 * values are present (no line is defined).
 */
export function detrend(x: Float64Array): { values: Float64Array; fitted: boolean } {
  const t = new Float64Array(x.length);
  for (let i = 0; i < x.length; i++) t[i] = i;
  const fit = ols(t, x);
  if (fit.slope === null || fit.intercept === null) return { values: Float64Array.from(x), fitted: false };
  const out = new Float64Array(x.length);
  for (let i = 0; i < x.length; i++) out[i] = x[i] - (fit.intercept + fit.slope * i);
  return { values: out, fitted: true };
}

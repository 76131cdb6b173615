import { ols } from '../stats/ols';
import { toFloat64 } from './to-float64';
import type { MonthlySeries } from './types';

/** Body of POST /api/analysis/trend. */
export interface TrendInput {
  series: MonthlySeries;
  per?: 'year' | 'decade';
}

/** Linear trend: slope (and its standard error) per year or per decade; intercept at the series' first month. */
export interface TrendOutput {
  slope: number | null;
  intercept: number | null;
  slopeStdErr: number | null;
  r2: number | null;
  n: number;
}

/**
 * OLS trend of a monthly series on time in years from its first month (first month 0, each month
 * 1/12 — months treated as equal twelfths of a year), by the centred formulation of ols().
 * per = "decade" multiplies slope and its standard error by 10. Undefined statistics are null.
 */
export function trend(req: TrendInput): TrendOutput {
  const y = toFloat64(req.series.values);
  const t = new Float64Array(y.length);
  for (let i = 0; i < y.length; i++) t[i] = i / 12;
  const fit = ols(t, y);
  const k = req.per === 'decade' ? 10 : 1;
  return {
    slope: fit.slope === null ? null : fit.slope * k,
    intercept: fit.intercept,
    slopeStdErr: fit.slopeStdErr === null ? null : fit.slopeStdErr * k,
    r2: fit.r2,
    n: fit.n,
  };
}

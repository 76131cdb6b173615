import { lag1Autocorrelation } from '../stats/lag1-autocorrelation';
import { ols } from '../stats/ols';
import { studentTTwoSidedP } from '../stats/student-t';
import { toFloat64 } from './to-float64';
import type { MonthlySeries } from './types';

/** Body of POST /api/analysis/trend. */
export interface TrendInput {
  series: MonthlySeries;
  per?: 'year' | 'decade';
}

/**
 * Linear trend: slope (and its standard errors) per year or per decade; intercept at the series'
 * first month. slopeStdErr is the OLS one (independent months); slopeStdErrAdjusted widens it for
 * autocorrelated residuals, with nEffResiduals and the two-sided pAdjusted that go with it.
 */
export interface TrendOutput {
  slope: number | null;
  intercept: number | null;
  slopeStdErr: number | null;
  r2: number | null;
  n: number;
  slopeStdErrAdjusted: number | null;
  nEffResiduals: number | null;
  pAdjusted: number | null;
}

/**
 * OLS trend of a monthly series on time in years from its first month (first month 0, each month
 * 1/12 — months treated as equal twelfths of a year), by the centred formulation of ols().
 * per = "decade" multiplies slope and its standard errors by 10. The adjustment for autocorrelated
 * residuals follows Santer et al. (2000, J. Geophys. Res. 105(D6):7337–7356): r1 = lag-1
 * autocorrelation of the residuals (NIST StRD definition, gaps break pairs), n_eff = n(1 − r1)/(1 + r1),
 * SE_adj = SE_ols·√((n − 2)/(n_eff − 2)), t = slope/SE_adj with n_eff − 2 degrees of freedom.
 * n_eff is not capped at n (a negative r1 narrows the SE, as the formula says). Undefined
 * statistics are null (n_eff ≤ 2 leaves the adjusted ones null).
 */
export function trend(req: TrendInput): TrendOutput {
  const y = toFloat64(req.series.values);
  const t = new Float64Array(y.length);
  for (let i = 0; i < y.length; i++) t[i] = i / 12;
  const fit = ols(t, y);
  const k = req.per === 'decade' ? 10 : 1;
  const adjusted = adjustForResiduals(fit.slope, fit.intercept, fit.slopeStdErr, fit.n, t, y);
  return {
    slope: fit.slope === null ? null : fit.slope * k,
    intercept: fit.intercept,
    slopeStdErr: fit.slopeStdErr === null ? null : fit.slopeStdErr * k,
    r2: fit.r2,
    n: fit.n,
    slopeStdErrAdjusted: adjusted.se === null ? null : adjusted.se * k,
    nEffResiduals: adjusted.nEff,
    pAdjusted: adjusted.p,
  };
}

/** Santer et al. (2000) adjustment of the slope's SE from the residuals' lag-1 autocorrelation. */
function adjustForResiduals(slope: number | null, intercept: number | null, se: number | null, n: number, t: Float64Array, y: Float64Array) {
  const none = { se: null, nEff: null, p: null };
  if (slope === null || intercept === null || se === null) return none;
  const residuals: (number | null)[] = new Array(y.length);
  for (let i = 0; i < y.length; i++) residuals[i] = y[i] === y[i] ? y[i] - (intercept + slope * t[i]) : null;
  const r1 = lag1Autocorrelation(residuals);
  if (r1 === null || !(r1 > -1)) return none;
  const nEff = (n * (1 - r1)) / (1 + r1);
  if (!(nEff > 2)) return { se: null, nEff, p: null };
  const seAdj = se * Math.sqrt((n - 2) / (nEff - 2));
  return { se: seAdj, nEff, p: seAdj > 0 ? studentTTwoSidedP(slope / seAdj, nEff - 2) : null };
}

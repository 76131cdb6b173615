import { solveLinear } from '../stats/solve-linear';
import type { BaseMonthStats } from './base-month-stats';

/** Largest number of sine/cosine pairs on 12 monthly points: the 6th harmonic's sine vanishes at whole months. */
export const MAX_HARMONICS = 5;

/**
 * Harmonic climatology: least-squares fit over all base-period values of a mean plus `harmonics`
 * pairs cos(2πk·m/12), sin(2πk·m/12), k = 1..H, evaluated at calendar months m = 0..11.
 * Because every value of month m shares the regressors of m, the fit over values equals a fit to
 * the monthly means weighted by their counts (Σ(y − f)² = within-month SS + Σ c_m(ȳ_m − f_m)²),
 * so only the 12 tallies are needed. Means are centred on the grand mean first for conditioning.
 * NaN everywhere (with a warning) when fewer than 2H+1 calendar months hold data.
 */
export function harmonicClimatology(
  stats: BaseMonthStats,
  harmonics: number,
): { climatology: Float64Array; warnings: string[] } {
  const p = 2 * harmonics + 1;
  const climatology = new Float64Array(12).fill(NaN);
  let total = 0;
  let n = 0;
  let monthsWithData = 0;
  for (let m = 0; m < 12; m++) {
    total += stats.sum[m];
    n += stats.count[m];
    if (stats.count[m] > 0) monthsWithData++;
  }
  if (monthsWithData < p) {
    return {
      climatology,
      warnings: [`harmonic climatology is null: ${monthsWithData} calendar months hold base-period data, ${p} are needed for ${harmonics} harmonics`],
    };
  }
  const grand = total / n;
  const basis = (m: number, j: number) =>
    j === 0 ? 1 : (j % 2 === 1 ? Math.cos : Math.sin)((2 * Math.PI * Math.ceil(j / 2) * m) / 12);
  const normal = new Float64Array(p * p);
  const rhs = new Float64Array(p);
  for (let m = 0; m < 12; m++) {
    const c = stats.count[m];
    if (c === 0) continue;
    const dev = stats.sum[m] / c - grand;
    for (let i = 0; i < p; i++) {
      rhs[i] += c * dev * basis(m, i);
      for (let j = 0; j < p; j++) normal[i * p + j] += c * basis(m, i) * basis(m, j);
    }
  }
  const coef = solveLinear(normal, rhs, p);
  if (coef === null) return { climatology, warnings: ['harmonic climatology is null: the fit is singular for these months'] };
  for (let m = 0; m < 12; m++) {
    let f = 0;
    for (let j = 0; j < p; j++) f += coef[j] * basis(m, j);
    climatology[m] = grand + f;
  }
  return { climatology, warnings: [] };
}

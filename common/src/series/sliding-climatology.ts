import { baseMonthStats } from './base-month-stats';
import { harmonicClimatology } from './climatology-harmonic';
import { monthlyClimatology } from './climatology-monthly';
import { slidingBasePeriods } from './sliding-base-periods';

/**
 * The climatology each month of x is measured against when the base period slides (slidingBasePeriods:
 * centred 30-year bases updated every 5 years): per block, the monthly-mean (or harmonic) climatology
 * of its base with the usual minimum-years rule, written at every month of the block's years. x: NaN
 * = missing, x[0] at month index `start`. `latest` is the last block's 12 values; warnings name the block.
 */
export function slidingClimatology(
  x: Float64Array,
  start: number,
  options: { method?: 'monthly-mean' | 'harmonic'; harmonics?: number; minYears?: number },
): { perMonth: Float64Array; latest: number[]; warnings: string[] } {
  const perMonth = new Float64Array(x.length).fill(NaN);
  const warnings: string[] = [];
  let latest: number[] = new Array(12).fill(NaN);
  if (x.length === 0) return { perMonth, latest, warnings };
  const end = start + x.length - 1;
  const firstYear = Math.floor(start / 12);
  const lastYear = Math.floor(end / 12);
  // Years whose twelve months all lie inside the series.
  const complete: [number, number] = [start % 12 === 0 ? firstYear : firstYear + 1, end % 12 === 11 ? lastYear : lastYear - 1];
  for (const block of slidingBasePeriods(firstYear, lastYear, complete[1] >= complete[0] ? complete : [firstYear, lastYear])) {
    const stats = baseMonthStats(x, start, block.base[0] * 12, block.base[1] * 12 + 11);
    const clim = options.method === 'harmonic' ? harmonicClimatology(stats, options.harmonics ?? 2) : monthlyClimatology(stats, options.minYears);
    warnings.push(...clim.warnings.map((w) => `years ${block.years[0]}–${block.years[1]} (base ${block.base[0]}–${block.base[1]}): ${w}`));
    const i0 = Math.max(0, block.years[0] * 12 - start);
    const i1 = Math.min(x.length - 1, block.years[1] * 12 + 11 - start);
    for (let i = i0; i <= i1; i++) perMonth[i] = clim.climatology[(start + i) % 12];
    latest = clim.climatology;
  }
  return { perMonth, latest, warnings };
}

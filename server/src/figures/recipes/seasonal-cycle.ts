/**
 * Seasonal-cycle recipe: the climatology of each calendar month over the base period with its spread.
 *
 * data: SeasonalCycleData (common/src/figure-kinds/seasonal-cycle) — `months` [{ month (1 = January), name, mean, sd, min, max, n, years }]:
 * mean as engine `monthlyClimatology` gives it (null when fewer than 80% of the base-period years
 * have a value, WMO-No. 1203), sd the sample standard deviation (n − 1, Welford) — null with the mean
 * or when n < 2 — min/max of the present values, n present values, years the month's base-period years.
 *
 * numbers:
 * - `amplitude` — largest minus smallest monthly mean, series units
 * - `max.month`, `min.month` — calendar month (1–12) of the largest / smallest mean
 */
import { baseMonthStats, describePeriod, monthlyClimatology, MONTH_NAMES, parseMonth, sampleSd, seasonalCycleMethods, toFloat64 } from '@upwell/common';
import { seriesAt } from '../series-input';
import { bindingAt, type FigureRecipeHandler } from './recipe';

/** The seasonal-cycle recipe. */
export const seasonalCycleRecipe: FigureRecipeHandler<'seasonal-cycle'> = {
  kind: 'seasonal-cycle',
  bindings: (r) => [bindingAt('series', r.series)],
  compute(r, inputs) {
    const s = seriesAt(inputs, 'series');
    const start = parseMonth(s.start);
    const from = parseMonth(r.base.from);
    const to = parseMonth(r.base.to);
    const stats = baseMonthStats(toFloat64(s.values), start, from, to);
    const clim = monthlyClimatology(stats);
    const byMonth: number[][] = Array.from({ length: 12 }, () => []);
    for (let m = Math.max(from, start); m <= Math.min(to, start + s.values.length - 1); m++) {
      const v = s.values[m - start];
      if (v !== null) byMonth[m % 12].push(v);
    }
    const months = byMonth.map((vals, m) => {
      const mean = Number.isNaN(clim.climatology[m]) ? null : clim.climatology[m];
      return {
        month: m + 1,
        name: MONTH_NAMES[m],
        mean,
        sd: mean === null ? null : sampleSd(vals),
        min: vals.length ? Math.min(...vals) : null,
        max: vals.length ? Math.max(...vals) : null,
        n: vals.length,
        years: stats.occurrences[m],
      };
    });
    const withMean = months.filter((m) => m.mean !== null) as ((typeof months)[number] & { mean: number })[];
    const hi = withMean.reduce<(typeof withMean)[number] | null>((a, b) => (a === null || b.mean > a.mean ? b : a), null);
    const lo = withMean.reduce<(typeof withMean)[number] | null>((a, b) => (a === null || b.mean < a.mean ? b : a), null);
    const warnings = clim.warnings.map((w) => `${s.name}: ${w}`);
    if (withMean.length === 0) warnings.push(`${s.name}: no calendar month has enough values in the base period ${describePeriod(r.base)}`);
    return {
      data: { units: s.units, base: r.base, months },
      numbers: [
        { key: 'amplitude', label: `Seasonal amplitude of ${s.name} (largest minus smallest monthly mean)`, value: hi && lo ? hi.mean - lo.mean : null, units: s.units },
        { key: 'max.month', label: 'Calendar month of the largest mean (1 = January)', value: hi?.month ?? null, units: 'month' },
        { key: 'min.month', label: 'Calendar month of the smallest mean (1 = January)', value: lo?.month ?? null, units: 'month' },
      ],
      methods: seasonalCycleMethods(r, s),
      cautions: [],
      warnings,
    };
  },
};

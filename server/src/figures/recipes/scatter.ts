/**
 * Scatter recipe: pairs (index anomaly at month t, series anomaly at t + lag), aligned by calendar
 * month, with the ordinary-least-squares line of the series on the index (engine `ols`).
 *
 * data: ScatterData (common/src/figure-kinds/scatter) — `points` [{ month (the index month t), x, y }] where both are present,
 * `fit` { slope, intercept, slopeStdErr, r2, n }, `line` two points spanning the x range.
 *
 * numbers:
 * - `slope` — series units per index unit
 * - `intercept` — series units
 * - `r2`, `n` (pairs)
 */
import { CAUSATION_CAUTION, formatMonth, ols, parseMonth, scatterMethods } from '@upwell/common';
import { seriesAnomaly } from '../figure-anomaly';
import { seriesAt } from '../series-input';
import { bindingAt, type FigureRecipeHandler } from './recipe';

/** The scatter recipe. */
export const scatterRecipe: FigureRecipeHandler<'scatter'> = {
  kind: 'scatter',
  bindings: (r) => [bindingAt('index', r.index), bindingAt('series', r.series)],
  compute(r, inputs) {
    const index = seriesAt(inputs, 'index');
    const series = seriesAt(inputs, 'series');
    const x = seriesAnomaly(index, r.anomaly);
    const y = seriesAnomaly(series, r.anomaly);
    const x0 = parseMonth(x.start);
    const y0 = parseMonth(y.start);
    const points: { month: string; x: number; y: number }[] = [];
    for (let i = 0; i < x.values.length; i++) {
      const xv = x.values[i];
      const yv = y.values[x0 + i + r.lag - y0];
      if (xv !== null && yv !== null && yv !== undefined) points.push({ month: formatMonth(x0 + i), x: xv, y: yv });
    }
    const fit = ols(points.map((p) => p.x), points.map((p) => p.y));
    const xs = points.map((p) => p.x);
    const line =
      fit.slope === null || fit.intercept === null
        ? []
        : [Math.min(...xs), Math.max(...xs)].map((xv) => ({ x: xv, y: fit.intercept! + fit.slope! * xv }));
    const xUnits = r.anomaly.standardize ? 'standard deviations' : index.units;
    const yUnits = r.anomaly.standardize ? 'standard deviations' : series.units;
    return {
      data: { lag: r.lag, xUnits, yUnits, points, fit: { slope: fit.slope, intercept: fit.intercept, slopeStdErr: fit.slopeStdErr, r2: fit.r2, n: fit.n }, line },
      numbers: [
        { key: 'slope', label: `Regression slope of ${series.name} on ${index.name}`, value: fit.slope, units: `${yUnits} per ${xUnits}` },
        { key: 'intercept', label: 'Regression intercept', value: fit.intercept, units: yUnits },
        { key: 'r2', label: 'Coefficient of determination R²', value: fit.r2, units: '' },
        { key: 'n', label: 'Pairs', value: fit.n, units: 'pairs' },
      ],
      methods: scatterMethods(r, index, series),
      cautions: [CAUSATION_CAUTION],
      warnings: [...x.warnings, ...y.warnings],
    };
  },
};

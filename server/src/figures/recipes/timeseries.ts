/**
 * Timeseries recipe: a series (raw or anomalies) with its linear trend, and warm/cold events of an
 * index (the series itself when no index is bound) shaded behind it.
 *
 * data: TimeseriesData (common/src/figure-kinds/timeseries) — `points` [{ month, value }], `events` [{ phase, start, peak, end, months,
 * peakValue, strength, label }], `trend` { perDecade, perDecadeStdErr, r2, n } of the values shown.
 *
 * numbers:
 * - `trend.perDecade` — OLS slope of the shown values, series units per decade
 * - `events.warm.count`, `events.cold.count` — number of warm / cold events
 */
import { timeseriesMethods, trend } from '@upwell/common';
import { seriesAnomaly } from '../figure-anomaly';
import { resolveEvents } from '../figure-events';
import { seriesAt } from '../series-input';
import { bindingAt, monthRecords, type FigureRecipeHandler } from './recipe';

/** The timeseries recipe. */
export const timeseriesRecipe: FigureRecipeHandler<'timeseries'> = {
  kind: 'timeseries',
  bindings: (r) => [bindingAt('series', r.series), ...(r.index ? [bindingAt('index', r.index)] : [])],
  compute(r, inputs) {
    const series = seriesAt(inputs, 'series');
    const index = r.index ? seriesAt(inputs, 'index') : series;
    const warnings: string[] = [];
    let shown = { start: series.start, values: series.values };
    if (r.show === 'anomaly') {
      const a = seriesAnomaly(series, r.anomaly);
      warnings.push(...a.warnings);
      shown = a;
    }
    const ev = resolveEvents(r.events, index, r.anomaly, inputs.eventSet);
    warnings.push(...ev.warnings.filter((w) => !warnings.includes(w)));
    const t = trend({ series: shown, per: 'decade' });
    const units = r.show === 'anomaly' && r.anomaly.standardize ? 'standard deviations' : series.units;
    const count = (phase: string) => ev.events.filter((e) => e.phase === phase).length;
    const used = index === series ? [series] : [series, index];
    return {
      data: {
        units,
        show: r.show,
        points: monthRecords(shown.start, shown.values),
        events: ev.events,
        trend: {
          perDecade: t.slope,
          perDecadeStdErr: t.slopeStdErr,
          r2: t.r2,
          n: t.n,
          perDecadeStdErrAdjusted: t.slopeStdErrAdjusted,
          nEffResiduals: t.nEffResiduals,
          pAdjusted: t.pAdjusted,
        },
      },
      numbers: [
        { key: 'trend.perDecade', label: `Linear trend of ${series.name}${r.show === 'anomaly' ? ' anomaly' : ''}`, value: t.slope, units: `${units}/decade` },
        { key: 'trend.perDecadeStdErr', label: 'Standard error of the trend (OLS, months independent)', value: t.slopeStdErr, units: `${units}/decade` },
        { key: 'trend.perDecadeStdErrAdjusted', label: 'Standard error of the trend (AR(1)-adjusted, Santer et al. 2000)', value: t.slopeStdErrAdjusted, units: `${units}/decade` },
        { key: 'trend.pAdjusted', label: 'p-value of the trend (two-sided, AR(1)-adjusted, Santer et al. 2000)', value: t.pAdjusted, units: '' },
        { key: 'events.warm.count', label: 'Number of warm events', value: count('warm'), units: 'events' },
        { key: 'events.cold.count', label: 'Number of cold events', value: count('cold'), units: 'events' },
      ],
      methods: timeseriesMethods(r, series, ev.clause, used),
      cautions: [],
      warnings,
    };
  },
};

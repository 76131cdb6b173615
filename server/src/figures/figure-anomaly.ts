import { anomaly } from '@upwell/common';
import type { LoadedSeries } from './loaded-inputs';
import type { AnomalyOpts } from './methods';

/** A series' anomalies on its own months, with the engine's warnings named after the series. */
export interface SeriesAnomaly {
  start: string;
  values: (number | null)[];
  warnings: string[];
}

/**
 * Anomalies of a loaded series with the recipe's options (engine `anomaly`), optionally with some
 * steps left out: an index for the event rule is smoothed by the rule, and a carbon series keeps
 * its units (no standardizing) and its monthly detail (no smoothing) so its change can be summed.
 */
export function seriesAnomaly(s: LoadedSeries, a: AnomalyOpts, skip: ('standardize' | 'smooth')[] = []): SeriesAnomaly {
  const out = anomaly({
    series: { start: s.start, values: s.values },
    base: a.base,
    method: a.method,
    detrend: a.detrend,
    standardize: a.standardize && !skip.includes('standardize'),
    smooth: skip.includes('smooth') ? 1 : a.smooth,
  });
  return { start: out.anomaly.start, values: out.anomaly.values, warnings: out.warnings.map((w) => `${s.name}: ${w}`) };
}

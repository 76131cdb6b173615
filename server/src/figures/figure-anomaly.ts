import { anomaly, type AnomalyInput, type ParsedAnomalyOptions } from '@upwell/common';
import type { LoadedSeries } from './loaded-inputs';

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
export function seriesAnomaly(s: LoadedSeries, a: ParsedAnomalyOptions, skip: ('standardize' | 'smooth')[] = []): SeriesAnomaly {
  // The recipe's anomaly options are the engine's input, field for field (one definition: the schema).
  const out = anomaly({
    series: { start: s.start, values: s.values },
    ...a,
    standardize: a.standardize && !skip.includes('standardize'),
    smooth: skip.includes('smooth') ? 1 : a.smooth,
  } satisfies AnomalyInput);
  return { start: out.anomaly.start, values: out.anomaly.values, warnings: out.warnings.map((w) => `${s.name}: ${w}`) };
}

import type { z } from 'zod';
import { describeAnomaly, methodsSentence, type NamedVersion } from '../shared/methods';
import type { timeseriesRecipeSchema } from './index';

/** The methods sentence of a timeseries figure; `eventsClause` says where the shaded events came from. */
export function timeseriesMethods(r: z.output<typeof timeseriesRecipeSchema>, series: NamedVersion, eventsClause: string, used: NamedVersion[]): string {
  return methodsSentence(
    [
      r.show === 'anomaly' ? `${series.name} as ${describeAnomaly(r.anomaly)}` : `${series.name} as stored`,
      'trend by ordinary least squares, per decade',
      `shaded ${eventsClause}`,
    ],
    used,
  );
}

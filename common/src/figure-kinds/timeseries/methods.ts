import type { z } from 'zod';
import { describeAnomaly, methodsSentence, type NamedVersion } from '../shared/methods';
import type { timeseriesRecipeSchema } from './index';

/** The methods sentence of a timeseries figure; `eventsClause` says where the shaded events came from. */
export function timeseriesMethods(r: z.output<typeof timeseriesRecipeSchema>, series: NamedVersion, eventsClause: string, used: NamedVersion[]): string {
  return methodsSentence(
    [
      r.show === 'anomaly' ? `${series.name} as ${describeAnomaly(r.anomaly)}` : `${series.name} as stored`,
      'trend by ordinary least squares, per decade, with the OLS standard error and the standard error and p adjusted for AR(1) residuals (nEff = n(1 − r1)/(1 + r1), Santer et al. 2000, J. Geophys. Res.)',
      `shaded ${eventsClause}`,
    ],
    used,
  );
}

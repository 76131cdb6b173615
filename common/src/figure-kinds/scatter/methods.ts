import type { z } from 'zod';
import { describeAnomaly, methodsSentence, type NamedVersion } from '../shared/methods';
import type { scatterRecipeSchema } from './index';

/** The methods sentence of a scatter figure. */
export function scatterMethods(r: z.output<typeof scatterRecipeSchema>, index: NamedVersion, series: NamedVersion): string {
  return methodsSentence(
    [
      `${series.name} against ${index.name} ${describeAnomaly(r.anomaly)}, ${series.name} taken ${r.lag} month${Math.abs(r.lag) === 1 ? '' : 's'} after ${index.name}`,
      'line by ordinary least squares of the series on the index, its slope standard error the OLS one (pairs taken as independent, not adjusted for autocorrelation)',
    ],
    [index, series],
  );
}

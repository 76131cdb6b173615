import type { z } from 'zod';
import { describePeriod, methodsSentence, WMO_CLIMATOLOGY_RULE, type NamedVersion } from '../shared/methods';
import type { seasonalCycleRecipeSchema } from './index';

/** The methods sentence of a seasonal-cycle figure. */
export function seasonalCycleMethods(r: z.output<typeof seasonalCycleRecipeSchema>, series: NamedVersion): string {
  return methodsSentence(
    [
      `monthly-mean climatology of ${series.name} over ${describePeriod(r.base)} (${WMO_CLIMATOLOGY_RULE})`,
      'spread as the sample standard deviation (n − 1) and the range of each calendar month’s values',
    ],
    [series],
  );
}

import type { z } from 'zod';
import { describePeriod, methodsSentence, WMO_CLIMATOLOGY_RULE, type NamedVersion } from '../shared/methods';
import type { hovmollerRecipeSchema } from './index';

/** The methods sentence of a time–latitude diagram of the zonal mean `field`. */
export function hovmollerMethods(r: z.output<typeof hovmollerRecipeSchema>, field: NamedVersion): string {
  return methodsSentence(
    [
      r.show === 'anomaly'
        ? `zonal mean ${field.name} as anomalies of each latitude against its ${describePeriod(r.base)} monthly-mean climatology (${WMO_CLIMATOLOGY_RULE})`
        : `zonal mean ${field.name} as stored`,
    ],
    [field],
  );
}

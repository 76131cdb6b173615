import type { z } from 'zod';
import { describeAnomaly, methodsSentence, type NamedVersion } from '../shared/methods';
import type { compositeRecipeSchema } from './index';

/** The methods sentence of a composite figure; `eventsClause` says where the events came from. */
export function compositeMethods(r: z.output<typeof compositeRecipeSchema>, index: NamedVersion, series: NamedVersion, eventsClause: string): string {
  const pct = Math.round(r.confidence * 1000) / 10;
  return methodsSentence(
    [
      `composite of ${series.name} ${describeAnomaly(r.anomaly)}, from ${r.before} months before to ${r.after} months after the peak of each ${r.phase} event`,
      eventsClause,
      `${pct}% interval as mean ± t·s/√n over the events present at each offset`,
    ],
    [index, series],
  );
}

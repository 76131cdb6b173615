import type { z } from 'zod';
import { describeAnomaly, methodsSentence, NEFF_FORM, type NamedVersion } from '../shared/methods';
import type { lagCorrelationRecipeSchema } from './index';

/** The methods sentence of a lag-correlation figure. */
export function lagCorrelationMethods(r: z.output<typeof lagCorrelationRecipeSchema>, index: NamedVersion, series: NamedVersion): string {
  return methodsSentence(
    [
      `${r.method === 'spearman' ? 'Spearman rank' : 'Pearson'} correlation of ${index.name} and ${series.name} ${describeAnomaly(r.anomaly)}, at lags −${r.maxLag} to +${r.maxLag} months (positive: ${index.name} leads)`,
      r.significance === 'phase-randomised'
        ? `pointwise p-values from ${r.surrogates} phase-randomised surrogates of ${index.name} (Ebisuzaki 1997, J. Climate), ${NEFF_FORM} for the threshold`
        : `pointwise two-sided t-test p-values with ${NEFF_FORM}`,
      `pointwise significance threshold |r| at alpha = ${r.alpha} from each lag's nEff (each lag tested alone, not corrected for the search over lags)`,
      r.surrogates > 0
        ? `the strongest lag's p corrected for the search over lags −${r.maxLag} to +${r.maxLag} with ${r.surrogates} phase-randomised surrogates (share whose largest |r| over those lags reaches the observed one; Ebisuzaki 1997, J. Climate)`
        : '',
    ],
    [index, series],
  );
}

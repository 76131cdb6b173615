import type { z } from 'zod';
import { describeAnomaly, methodsSentence, type NamedVersion } from '../shared/methods';
import type { eventTableRecipeSchema } from './index';

/** The methods sentence of an event table; `eventsClause` says where the events came from. */
export function eventTableMethods(r: z.output<typeof eventTableRecipeSchema>, index: NamedVersion, carbon: NamedVersion[], eventsClause: string): string {
  const carbonClause = carbon.length
    ? `carbon change in Pg C over each event's months from ${carbon.map((c) => c.name).join(', ')} ${describeAnomaly(r.anomaly, { skip: ['standardize', 'smooth'] })}: ` +
      "a rate by integrating its anomaly over the event (calendar month lengths, Julian year of 365.25 days), an inventory as its anomaly's change over the same span, from the start of the first month to the end of the last, " +
      'boundary values as the mean of the neighbouring monthly means (weighted by month length when the months differ)'
    : '';
  return methodsSentence([eventsClause, carbonClause], [index, ...carbon]);
}

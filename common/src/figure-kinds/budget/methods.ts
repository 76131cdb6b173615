import { methodsSentence, type NamedVersion } from '../shared/methods';

/**
 * The methods sentence of a budget figure: `terms` by name with their series, `converted` the
 * terms whose unit was converted to the tendency's ("DIC advection from mol C/s").
 */
export function budgetMethods(tendency: NamedVersion & { units: string }, terms: { name: string; series: NamedVersion }[], converted: string[]): string {
  return methodsSentence(
    [
      `budget closure of ${tendency.name} against the sum of ${terms.map((t) => t.name).join(', ')}, month by month on the tendency's months`,
      converted.length ? `terms converted to ${tendency.units} (${converted.join('; ')})` : '',
      'residual = tendency − Σ terms; relative residual = rms(residual)/rms(tendency) over the months where the residual exists',
    ],
    [tendency, ...terms.map((t) => t.series)],
  );
}

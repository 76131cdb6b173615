import type { LoadedSeries, RecipeInputs } from './loaded-inputs';

/** The loaded series of a binding path; the service resolved every path a recipe declared. */
export function seriesAt(inputs: RecipeInputs, path: string): LoadedSeries {
  const s = inputs.series.get(path);
  // A recipe asking for a path it did not declare is a programming error, not bad input.
  if (!s) throw new Error(`recipe input "${path}" was not resolved`);
  return s;
}

import { formatMonth, parseMonth, type FigureKind, type MonthValue, type RecipeOf } from '@upwell/common';
import type { NamedBinding, RecipeInputs, RecipeOutput } from '../loaded-inputs';

/** One figure kind's compute: which series it binds, and how it computes its result from them. */
export interface FigureRecipeHandler<K extends FigureKind> {
  kind: K;
  /** Every series binding of the recipe, with the path that names it in messages. */
  bindings(recipe: RecipeOf<K>): NamedBinding[];
  /** Pure computation over resolved inputs; engine errors propagate to the service. */
  compute(recipe: RecipeOf<K>, inputs: RecipeInputs): RecipeOutput<K>;
}

/** A binding at a path. */
export function bindingAt(path: string, b: { seriesId: string; version: 'latest' | number }): NamedBinding {
  return { path, seriesId: b.seriesId, version: b.version };
}

/** A monthly series as vega-lite records `{ month: "YYYY-MM", value }`. */
export function monthRecords(start: string, values: ReadonlyArray<number | null>): MonthValue[] {
  const first = parseMonth(start);
  return values.map((value, i) => ({ month: formatMonth(first + i), value }));
}

import { formatMonth, parseMonth, type MonthValue, type ParsedFigureRecipe } from '@upwell/common';
import type { NamedBinding, RecipeInputs, RecipeOutput } from '../loaded-inputs';

/** The parsed recipe of one kind. */
export type RecipeOf<K extends ParsedFigureRecipe['kind']> = Extract<ParsedFigureRecipe, { kind: K }>;

/** One figure kind: which series it binds, and how it computes its result from them. */
export interface FigureRecipeHandler<K extends ParsedFigureRecipe['kind']> {
  kind: K;
  /** Every series binding of the recipe, with the path that names it in messages. */
  bindings(recipe: RecipeOf<K>): NamedBinding[];
  /** Pure computation over resolved inputs; engine errors propagate to the service. */
  compute(recipe: RecipeOf<K>, inputs: RecipeInputs): RecipeOutput;
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

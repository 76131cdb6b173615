import type { FigureRecipe, SeriesBinding } from '@upwell/common';

/** Every series a recipe binds (series, index, tendency, budget terms, carbon series), in recipe order. */
export function recipeBindings(recipe: FigureRecipe | Record<string, unknown> | null | undefined): SeriesBinding[] {
  if (!recipe) return [];
  const r = recipe as Record<string, unknown>;
  const out: SeriesBinding[] = [];
  const push = (b: unknown) => {
    if (b && typeof b === 'object' && typeof (b as SeriesBinding).seriesId === 'string') out.push(b as SeriesBinding);
  };
  push(r.index);
  push(r.series);
  push(r.tendency);
  if (Array.isArray(r.terms)) for (const t of r.terms) push((t as { series?: unknown })?.series);
  if (Array.isArray(r.carbon)) for (const c of r.carbon) push(c);
  return out;
}

/** True when the recipe follows the latest version of this series (so a new version changes it). */
export function followsLatest(recipe: FigureRecipe | Record<string, unknown> | null | undefined, seriesId: string): boolean {
  return recipeBindings(recipe).some((b) => b.seriesId === seriesId && (b.version === undefined || b.version === 'latest'));
}

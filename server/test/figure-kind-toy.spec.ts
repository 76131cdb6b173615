/**
 * Adding a figure kind touches three places: a folder in common (here common/test-fixtures/toy-kind),
 * one compute file on the server (test/fixtures/toy-kind.compute.ts) and one form-fields file on the
 * web (web/src/figures/toy-kind-fields.tsx, tested in web/src/figures/toy-kind.test.tsx). This test
 * adds the toy kind to the registries and computes it through them, as the figure service does.
 */
import { describe, expect, it } from 'vitest';
import { createFigureRegistry, FIGURE_KINDS, type UsedSeries } from '@upwell/common';
import { recentMeanKind } from '../../common/test-fixtures/toy-kind';
import type { LoadedSeries, RecipeInputs } from '../src/figures/loaded-inputs';
import { RECIPES } from '../src/figures/recipes';
import { computeRecipe } from '../src/figures/recipes/compute-recipe';
import { recentMeanRecipe } from './fixtures/toy-kind.compute';

const SERIES_ID = '6f1c2a9e-3b1d-4c55-9a0e-1f2d3c4b5a60';
const used: UsedSeries = { seriesId: SERIES_ID, name: 'Invented DIC', version: 2, units: 'Pg C', origin: 'model-output', valuesSha256: 'ab'.repeat(32) };
const series: LoadedSeries = { ...used, start: '2000-01', values: [10, 20, 1, 2, null, 3] };

describe('a toy figure kind added in three places', () => {
  const registry = createFigureRegistry([...FIGURE_KINDS, recentMeanKind]);
  const handlers = { ...RECIPES, 'recent-mean': recentMeanRecipe };

  it('parses its recipe with its own defaults through the registry’s recipe schema', () => {
    const recipe = registry.recipeSchema.parse({ kind: 'recent-mean', series: { seriesId: SERIES_ID }, months: 4 });
    expect(recipe).toEqual({ kind: 'recent-mean', series: { seriesId: SERIES_ID, version: 'latest' }, months: 4 });
    expect(registry.defaultRecipe('recent-mean')).toEqual({ kind: 'recent-mean', series: { seriesId: '', version: 'latest' }, months: 12 });
    expect(registry.recipeSchema.safeParse({ kind: 'recent-mean', series: { seriesId: SERIES_ID }, months: 121 }).success).toBe(false);
    // The existing kinds still parse through the extended registry.
    expect(registry.recipeSchema.safeParse({ kind: 'seasonal-cycle', series: { seriesId: SERIES_ID } }).success).toBe(true);
  });

  it('computes through the registry, its data checked by its result schema, then drawn and tabulated by its kind', () => {
    const recipe = registry.recipeSchema.parse({ kind: 'recent-mean', series: { seriesId: SERIES_ID }, months: 4 });
    const inputs: RecipeInputs = { series: new Map([['series', series]]), eventSet: null, zonalField: null };
    const out = computeRecipe(handlers as never, registry, recipe, inputs);
    // Worked example: the last four months are 1, 2, missing, 3 → mean of the present values (1 + 2 + 3) / 3 = 2.
    expect(out.data).toEqual({ units: 'Pg C', months: 4, n: 3, mean: 2 });
    expect(out.methods).toBe('Mean of Invented DIC over its last 4 months; computed from Invented DIC v2.');
    const result = { kind: 'recent-mean', data: out.data, used: [used] };
    expect(JSON.stringify(registry.spec(result))).toContain('Mean of the last 4 months (Pg C)');
    expect(registry.table(result)).toEqual({ header: ['months', 'n', 'mean (Pg C)'], rows: [[4, 3, 2]] });
    expect(registry.label('recent-mean')).toBe('Mean of the last months');
  });

  it('refuses data a compute makes in another shape (the edge checks what it sends)', () => {
    const broken = { ...recentMeanRecipe, compute: () => ({ data: { mean: 'two' }, numbers: [], methods: '', cautions: [], warnings: [] }) };
    const recipe = registry.recipeSchema.parse({ kind: 'recent-mean', series: { seriesId: SERIES_ID } });
    const inputs: RecipeInputs = { series: new Map([['series', series]]), eventSet: null, zonalField: null };
    expect(() => computeRecipe({ ...handlers, 'recent-mean': broken } as never, registry, recipe, inputs)).toThrow(/result schema refuses/);
  });
});

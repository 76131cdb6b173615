/**
 * A toy figure kind for the tests that show what adding a kind takes: this folder (recipe schema,
 * result schema, spec, table, label), one compute file on the server
 * (server/test/fixtures/toy-kind.compute.ts) and one form-fields file on the web
 * (web/src/figures/toy-kind-fields.tsx). Nothing else is touched: the tests build registries with it.
 */
import { z } from 'zod';
import { defineFigureKind } from '../../src/figure-kinds/kind';
import { seriesBindingSchema } from '../../src/figure-kinds/shared/recipe-parts';
import { BASE_CONFIG, SCHEMA } from '../../src/figure-kinds/shared/spec-parts';
import type { FigureSpec } from '../../src/figure-kinds/shared/spec-type';

/** Recipe: the mean of a series' last `months` values. */
export const recentMeanRecipeSchema = z.strictObject({
  kind: z.literal('recent-mean'),
  series: seriesBindingSchema,
  months: z.number().int().min(1).max(120).default(12),
});

/** Result: the mean, how many values it took, and the units. */
export const recentMeanResultSchema = z.object({ units: z.string(), months: z.number(), n: z.number(), mean: z.number().nullable() });
export type RecentMeanData = z.output<typeof recentMeanResultSchema>;

/** The toy kind. */
export const recentMeanKind = defineFigureKind({
  kind: 'recent-mean',
  label: 'Mean of the last months',
  recipe: recentMeanRecipeSchema,
  skeleton: { series: { seriesId: '', version: 'latest' } },
  result: recentMeanResultSchema,
  spec: (d) =>
    ({
      $schema: SCHEMA,
      data: { values: [{ mean: d.mean }] },
      mark: { type: 'rule' },
      encoding: { y: { field: 'mean', type: 'quantitative', title: `Mean of the last ${d.months} months (${d.units})` } },
      config: BASE_CONFIG,
    }) as FigureSpec,
  table: (d) => ({ header: ['months', 'n', `mean (${d.units})`], rows: [[d.months, d.n, d.mean]] }),
});

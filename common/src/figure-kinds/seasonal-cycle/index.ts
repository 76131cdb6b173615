/** The mean annual cycle of a series over the base period, with its spread. */
import { z } from 'zod';
import { defineFigureKind } from '../kind';
import { basePeriodSchema, DEFAULT_BASE_PERIOD, seriesBindingSchema } from '../shared/recipe-parts';
import { nullableNumber } from '../shared/result-parts';
import { seasonalCycleSpec } from './spec';

/** Recipe of a seasonal-cycle figure. */
export const seasonalCycleRecipeSchema = z.strictObject({
  kind: z.literal('seasonal-cycle'),
  series: seriesBindingSchema,
  base: basePeriodSchema.default(DEFAULT_BASE_PERIOD),
});

/** `data` of a seasonal-cycle figure: per calendar month (1 = January) over the base period. */
export const seasonalCycleResultSchema = z.object({
  units: z.string(),
  base: z.object({ from: z.string(), to: z.string() }),
  months: z.array(
    z.object({ month: z.number(), name: z.string(), mean: nullableNumber(), sd: nullableNumber(), min: nullableNumber(), max: nullableNumber(), n: z.number(), years: z.number() }),
  ),
});
export type SeasonalCycleData = z.output<typeof seasonalCycleResultSchema>;

/** The seasonal-cycle kind. */
export const seasonalCycleKind = defineFigureKind({
  kind: 'seasonal-cycle',
  label: 'Seasonal cycle',
  recipe: seasonalCycleRecipeSchema,
  skeleton: { series: { seriesId: '', version: 'latest' } },
  result: seasonalCycleResultSchema,
  spec: seasonalCycleSpec,
  table: (d) => ({ header: ['month', `mean (${d.units})`, 'sd', 'min', 'max', 'n'], rows: d.months.map((m) => [m.month, m.mean, m.sd, m.min, m.max, m.n]) }),
});

/** Budget closure: a tendency against the sum of its terms, month by month, with the residual. */
import { z } from 'zod';
import { defineFigureKind } from '../kind';
import { plainText } from '../../api/text';
import { FIGURE_LIMITS, seriesBindingSchema } from '../shared/recipe-parts';
import { nullableNumber } from '../shared/result-parts';
import { budgetSpec } from './spec';

/** Recipe of a budget figure. */
export const budgetRecipeSchema = z.strictObject({
  kind: z.literal('budget'),
  tendency: seriesBindingSchema,
  terms: z.array(z.strictObject({ name: plainText({ what: 'a term name' }).trim().min(1).max(60), series: seriesBindingSchema })).min(1).max(FIGURE_LIMITS.maxBoundSeries),
});

/** `data` of a budget figure: month records for lines, and one record per term and month for stacking. */
export const budgetResultSchema = z.object({
  units: z.string(),
  termNames: z.array(z.string()),
  months: z.array(z.object({ month: z.string(), tendency: nullableNumber(), sumOfTerms: nullableNumber(), residual: nullableNumber() })),
  terms: z.array(z.object({ month: z.string(), term: z.string(), value: nullableNumber() })),
  rmsResidual: nullableNumber(),
  relativeResidual: nullableNumber(),
});
export type BudgetData = z.output<typeof budgetResultSchema>;

/** The budget kind. */
export const budgetKind = defineFigureKind({
  kind: 'budget',
  label: 'Budget closure',
  recipe: budgetRecipeSchema,
  skeleton: { tendency: { seriesId: '', version: 'latest' }, terms: [{ name: 'advection', series: { seriesId: '', version: 'latest' } }] },
  result: budgetResultSchema,
  spec: budgetSpec,
  table(d) {
    const value = new Map(d.terms.map((t) => [`${t.term}@${t.month}`, t.value]));
    return {
      header: ['month', ...d.termNames.map((t) => `${t} (${d.units})`), 'tendency', 'residual'],
      rows: d.months.map((m) => [m.month, ...d.termNames.map((t) => value.get(`${t}@${m.month}`) ?? null), m.tendency, m.residual]),
    };
  },
});

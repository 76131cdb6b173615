/**
 * Budget recipe: the tendency against the sum of its terms, month by month (engine `budget`),
 * with every term converted to the tendency's unit (engine `unitFactor`; a term whose unit cannot
 * be converted is a 400 naming both units).
 *
 * data: BudgetData (common/src/figure-kinds/budget) — `months` [{ month, tendency, sumOfTerms, residual }] for lines, `terms`
 * [{ month, term, value }] for a stacked area or bars, `termNames`, `rmsResidual`, `relativeResidual`.
 *
 * numbers:
 * - `relativeResidual` — rms(residual)/rms(tendency) over the months where the residual exists
 * - `rmsResidual` — tendency units
 * - `meanResidual` — mean residual, tendency units
 */
import { AnalysisInputError, budget, budgetMethods, mean, parseMonth, unitFactor, type MonthlySeries } from '@upwell/common';
import { seriesAt } from '../series-input';
import { bindingAt, monthRecords, type FigureRecipeHandler } from './recipe';

/** The factor from one unit to another; identical spellings (also empty ones) need no parsing. */
function factor(from: string, to: string): number {
  return from.trim() === to.trim() ? 1 : unitFactor(from, to);
}

/** The budget recipe. */
export const budgetRecipe: FigureRecipeHandler<'budget'> = {
  kind: 'budget',
  bindings: (r) => [bindingAt('tendency', r.tendency), ...r.terms.map((t, i) => bindingAt(`terms.${i}.series`, t.series))],
  compute(r, inputs) {
    const tendency = seriesAt(inputs, 'tendency');
    const terms = r.terms.map((t, i) => ({ name: t.name, s: seriesAt(inputs, `terms.${i}.series`) }));
    const names = terms.map((t) => t.name);
    const twice = names.find((n, i) => names.indexOf(n) !== i);
    // Terms are keyed by name: a second term of the same name would silently replace the first.
    if (twice !== undefined) throw new AnalysisInputError(`two budget terms are named "${twice}"`);
    const termSeries: Record<string, MonthlySeries> = {};
    const converted: string[] = [];
    for (const { name, s } of terms) {
      const f = factor(s.units, tendency.units);
      if (f !== 1) converted.push(`${s.name} from ${s.units}`);
      termSeries[name] = { start: s.start, values: f === 1 ? s.values : s.values.map((v) => (v === null ? null : v * f)) };
    }
    const b = budget({ tendency: { start: tendency.start, values: tendency.values }, terms: termSeries });
    const first = parseMonth(tendency.start);
    const months = monthRecords(tendency.start, tendency.values).map((m, i) => ({
      month: m.month,
      tendency: m.value,
      sumOfTerms: b.sumOfTerms.values[i],
      residual: b.residual.values[i],
    }));
    const stacked = terms.flatMap(({ name }) => {
      const t = termSeries[name];
      const offset = parseMonth(t.start) - first;
      return months.map((m, i) => ({ month: m.month, term: name, value: t.values[i - offset] ?? null }));
    });
    return {
      data: { units: tendency.units, termNames: names, months, terms: stacked, rmsResidual: b.rmsResidual, relativeResidual: b.relativeResidual },
      numbers: [
        { key: 'relativeResidual', label: 'Relative budget residual, rms(residual)/rms(tendency)', value: b.relativeResidual, units: '' },
        { key: 'rmsResidual', label: 'Root-mean-square budget residual', value: b.rmsResidual, units: tendency.units },
        { key: 'meanResidual', label: 'Mean budget residual', value: mean(b.residual.values), units: tendency.units },
      ],
      methods: budgetMethods(tendency, terms.map((t) => ({ name: t.name, series: t.s })), converted),
      cautions: [],
      warnings: [],
    };
  },
};

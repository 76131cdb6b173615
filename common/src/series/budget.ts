import { AnalysisInputError } from './analysis-input-error';
import { parseMonth } from './month';
import { valuesOnSpan } from './on-span';
import { rms } from './rms';
import { toFloat64 } from './to-float64';
import { toNullable } from './to-nullable';
import type { MonthlySeries } from './types';

/** Body of POST /api/analysis/budget: a tendency and the named terms that should add up to it. */
export interface BudgetInput {
  tendency: MonthlySeries;
  terms: Record<string, MonthlySeries>;
}

/** Budget closure: Σ terms, residual = tendency − Σ terms, and their sizes. */
export interface BudgetOutput {
  sumOfTerms: { start: string; values: (number | null)[] };
  residual: { start: string; values: (number | null)[] };
  rmsResidual: number | null;
  relativeResidual: number | null;
}

/**
 * Closes a budget month by month on the tendency's months (terms aligned by calendar month).
 * A month with any term missing (or outside a term's span) has a null sum; a month with the sum or
 * the tendency missing has a null residual. relativeResidual = rms(residual)/rms(tendency), both over the months where the
 * residual exists, so the two rms see the same months; null when undefined (no months, zero tendency).
 */
export function budget(req: BudgetInput): BudgetOutput {
  const names = Object.keys(req.terms);
  if (names.length === 0) throw new AnalysisInputError('budget needs at least one term');
  const start = parseMonth(req.tendency.start);
  const tendency = toFloat64(req.tendency.values);
  const n = tendency.length;
  const sum = new Float64Array(n);
  for (const name of names) {
    const term = valuesOnSpan(req.terms[name], start, n);
    for (let i = 0; i < n; i++) sum[i] += term[i];
  }
  const residual = new Float64Array(n);
  const tendencyUsed = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    residual[i] = tendency[i] - sum[i];
    tendencyUsed[i] = residual[i] === residual[i] ? tendency[i] : NaN;
  }
  const rmsResidual = rms(residual);
  const rmsTendency = rms(tendencyUsed);
  return {
    sumOfTerms: { start: req.tendency.start, values: toNullable(sum) },
    residual: { start: req.tendency.start, values: toNullable(residual) },
    rmsResidual,
    relativeResidual: rmsResidual === null || rmsTendency === null || rmsTendency === 0 ? null : rmsResidual / rmsTendency,
  };
}

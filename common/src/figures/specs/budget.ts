import type { FigureRecipe } from '../../api/figures';
import type { FigureSpec } from './spec-type';
import { budgetColour } from '../budget-colours';
import type { BudgetPlotData } from '../figure-data';
import { formatValue } from '../format';
import { axisTitle, BASE_CONFIG, monthStart, SCHEMA } from './common';

/**
 * Budget closure: the terms stacked as bars each month, the tendency as a
 * line over them, the residual (tendency − sum of terms) as a dashed line.
 * Every term keeps its colour from budget-colours, named in the legend.
 */
export function budgetSpec(data: BudgetPlotData, _recipe?: FigureRecipe): FigureSpec {
  const termValues = data.terms.flatMap((t) => data.months.map((m, i) => ({ month: monthStart(m), term: t.name, value: t.values[i] ?? null })));
  const lines = data.months.flatMap((m, i) => [
    { month: monthStart(m), term: 'tendency', value: data.tendency[i] ?? null },
    { month: monthStart(m), term: 'residual', value: data.residual[i] ?? null },
  ]);
  const domain = [...data.terms.map((t) => t.name), 'tendency', 'residual'];
  const color = { field: 'term', type: 'nominal', scale: { domain, range: domain.map(budgetColour) }, legend: { title: 'Budget term' } };
  const x = { field: 'month', type: 'temporal', title: 'Month' };
  const y = axisTitle('Rate of change', data.units);
  const rms = data.rmsResidual === null ? 'n/a' : formatValue(data.rmsResidual, 3);
  const rel = data.relativeResidual === null ? '' : ` (${formatValue(data.relativeResidual * 100, 0)}% of the tendency)`;
  return {
    $schema: SCHEMA,
    width: 'container',
    height: 280,
    layer: [
      {
        data: { values: termValues },
        mark: { type: 'bar' },
        encoding: { x, y: { field: 'value', type: 'quantitative', stack: 'zero', title: y }, color },
      },
      {
        data: { values: lines },
        transform: [{ filter: "datum.term === 'tendency'" }],
        mark: { type: 'line', strokeWidth: 2 },
        encoding: { x, y: { field: 'value', type: 'quantitative', title: y }, color },
      },
      {
        data: { values: lines },
        transform: [{ filter: "datum.term === 'residual'" }],
        mark: { type: 'line', strokeWidth: 1.5, strokeDash: [5, 3], point: { size: 14 } },
        encoding: { x, y: { field: 'value', type: 'quantitative', title: y }, color },
      },
    ],
    title: { text: `Terms stacked (bars), tendency (solid), residual (dashed); RMS residual ${rms} ${data.units}${rel}`, fontSize: 11 },
    config: BASE_CONFIG,
  } as FigureSpec;
}

import { budgetColour } from '../../figures/budget-colours';
import { formatValue } from '../../figures/format';
import type { SpecContext } from '../kind';
import type { FigureSpec } from '../shared/spec-type';
import { axisTitle, BASE_CONFIG, monthStart, SCHEMA } from '../shared/spec-parts';
import type { BudgetData } from './index';

/**
 * Budget closure: the terms stacked as bars each month, the tendency as a
 * line over them, the residual (tendency − sum of terms) as a dashed line.
 * Every term keeps its colour from budget-colours, named in the legend.
 */
export function budgetSpec(data: BudgetData, _ctx?: SpecContext): FigureSpec {
  const termValues = data.terms.map((t) => ({ month: monthStart(t.month), term: t.term, value: t.value }));
  const lines = data.months.flatMap((m) => [
    { month: monthStart(m.month), term: 'tendency', value: m.tendency },
    { month: monthStart(m.month), term: 'residual', value: m.residual },
  ]);
  const domain = [...data.termNames, 'tendency', 'residual'];
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

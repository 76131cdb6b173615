import type { FigureRecipe } from '../../api/figures';
import type { FigureSpec } from './spec-type';
import type { CompositePlotData } from '../figure-data';
import { axisTitle, BASE_CONFIG, COLD, SCHEMA, WARM } from './common';

/** An event composite: each event as a thin grey line, the confidence band, and the mean on top. */
export function compositeSpec(data: CompositePlotData, recipe?: FigureRecipe): FigureSpec {
  const phase = data.phase ?? (recipe && 'phase' in recipe ? recipe.phase : undefined) ?? 'warm';
  const confidence = recipe && 'confidence' in recipe && recipe.confidence !== undefined ? recipe.confidence : 0.95;
  const colour = phase === 'cold' ? COLD : WARM;
  const stats = data.offsets.map((offset, i) => ({ offset, mean: data.mean[i], lower: data.lower[i], upper: data.upper[i], n: data.n[i] }));
  const members = data.members.flatMap((m) => data.offsets.map((offset, i) => ({ member: m.at, offset, value: m.values[i] ?? null })));
  const x = { field: 'offset', type: 'quantitative', title: 'Months from the event peak (0 = peak)' };
  const y = axisTitle(`Composite anomaly, ${phase} events`, data.units);
  return {
    $schema: SCHEMA,
    width: 'container',
    height: 260,
    layer: [
      { mark: { type: 'rule', color: '#9aa0a3', strokeWidth: 0.75 }, encoding: { y: { datum: 0 } } },
      { mark: { type: 'rule', color: '#9aa0a3', strokeDash: [2, 2] }, encoding: { x: { datum: 0 } } },
      {
        data: { values: members },
        mark: { type: 'line', color: '#b5b5b5', strokeWidth: 0.6, opacity: 0.8 },
        encoding: { x, y: { field: 'value', type: 'quantitative', title: y }, detail: { field: 'member', type: 'nominal' } },
      },
      {
        data: { values: stats },
        mark: { type: 'area', color: colour, opacity: 0.18 },
        encoding: { x, y: { field: 'lower', type: 'quantitative', title: y }, y2: { field: 'upper' } },
      },
      {
        data: { values: stats },
        mark: { type: 'line', color: colour, strokeWidth: 2 },
        encoding: { x, y: { field: 'mean', type: 'quantitative', title: y } },
      },
    ],
    title: {
      text: `Mean of ${data.members.length} ${phase} events (line), ${Math.round(confidence * 100)}% confidence band (shaded), each event in grey`,
      fontSize: 11,
    },
    config: BASE_CONFIG,
  } as FigureSpec;
}

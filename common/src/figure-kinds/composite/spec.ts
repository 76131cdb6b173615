import type { SpecContext } from '../kind';
import type { FigureSpec } from '../shared/spec-type';
import { axisTitle, BASE_CONFIG, COLD, SCHEMA, WARM } from '../shared/spec-parts';
import type { CompositeData } from './index';

/** An event composite: each event as a thin grey line, the confidence band, and the mean on top. */
export function compositeSpec(data: CompositeData, _ctx?: SpecContext): FigureSpec {
  const { phase, confidence } = data;
  const colour = phase === 'cold' ? COLD : WARM;
  const stats = data.offsets;
  const members = data.members.map((m) => ({ member: m.event, offset: m.offset, value: m.value }));
  const memberCount = new Set(data.members.map((m) => m.event)).size;
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
      text: `Mean of ${memberCount} ${phase} events (line), ${Math.round(confidence * 100)}% confidence band (shaded), each event in grey`,
      fontSize: 11,
    },
    config: BASE_CONFIG,
  } as FigureSpec;
}

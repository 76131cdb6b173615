import type { SpecContext } from '../kind';
import type { FigureSpec } from '../shared/spec-type';
import { ACCENT, axisTitle, BASE_CONFIG, SCHEMA } from '../shared/spec-parts';
import type { SeasonalCycleData } from './index';

const MONTH_NAMES = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** The mean annual cycle over the base period: mean line, ±1 sd band, and the range as whiskers. */
export function seasonalCycleSpec(data: SeasonalCycleData, _ctx?: SpecContext): FigureSpec {
  const values = data.months.map((m) => ({
    ...m,
    name: MONTH_NAMES[m.month - 1],
    low: m.mean !== null && m.sd !== null ? m.mean - m.sd : null,
    high: m.mean !== null && m.sd !== null ? m.mean + m.sd : null,
  }));
  const x = { field: 'name', type: 'ordinal', sort: MONTH_NAMES, title: 'Calendar month', axis: { labelAngle: 0 } };
  const y = axisTitle('Monthly mean', data.units);
  return {
    $schema: SCHEMA,
    width: 'container',
    height: 240,
    data: { values },
    layer: [
      { mark: { type: 'rule', color: '#b8b2a4' }, encoding: { x, y: { field: 'min', type: 'quantitative', title: y }, y2: { field: 'max' } } },
      { mark: { type: 'bar', color: ACCENT, opacity: 0.22, width: { band: 0.5 } }, encoding: { x, y: { field: 'low', type: 'quantitative' }, y2: { field: 'high' } } },
      {
        mark: { type: 'line', color: ACCENT, point: { filled: true, size: 30 } },
        encoding: { x, y: { field: 'mean', type: 'quantitative', title: y, scale: { zero: false } } },
      },
    ],
    title: { text: 'Mean ± 1 standard deviation (bars); whiskers show the lowest and highest month', fontSize: 11 },
    config: BASE_CONFIG,
  } as FigureSpec;
}

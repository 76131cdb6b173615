import type { SpecContext } from '../kind';
import type { FigureSpec } from '../shared/spec-type';
import { axisTitle, BASE_CONFIG, eventLayers, INK, monthStart, SCHEMA } from '../shared/spec-parts';
import type { TimeseriesData } from './index';

/** A series over time (raw or anomaly) with warm and cold events shaded behind it. */
export function timeseriesSpec(data: TimeseriesData, _ctx?: SpecContext): FigureSpec {
  const anomaly = data.show === 'anomaly';
  const label = `Series${anomaly ? ' anomaly' : ''}`;
  const points = data.points.map((p) => ({ month: monthStart(p.month), value: p.value }));
  const layers: unknown[] = [...eventLayers(data.events)];
  if (anomaly) layers.push({ mark: { type: 'rule', color: '#9aa0a3', strokeWidth: 0.75 }, encoding: { y: { datum: 0 } } });
  layers.push({
    data: { values: points },
    mark: { type: 'line', color: INK, strokeWidth: 1.25 },
    encoding: {
      x: { field: 'month', type: 'temporal', title: 'Month' },
      y: { field: 'value', type: 'quantitative', title: axisTitle(label, data.units), scale: { zero: false } },
    },
  });
  return { $schema: SCHEMA, width: 'container', height: 260, layer: layers, config: BASE_CONFIG } as FigureSpec;
}

import type { FigureRecipe } from '../../api/figures';
import type { FigureSpec } from './spec-type';
import type { TimeseriesPlotData } from '../figure-data';
import { axisTitle, BASE_CONFIG, eventLayers, INK, monthStart, SCHEMA } from './common';

/** A series over time (raw or anomaly) with warm and cold events shaded behind it. */
export function timeseriesSpec(data: TimeseriesPlotData, _recipe?: FigureRecipe): FigureSpec {
  const anomaly = data.show === 'anomaly';
  const label = `${data.name ?? 'Series'}${anomaly ? ' anomaly' : ''}`;
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

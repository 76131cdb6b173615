import type { SpecContext } from '../kind';
import type { FigureSpec } from '../shared/spec-type';
import { axisTitle, BASE_CONFIG, monthAfter, monthStart, SCHEMA } from '../shared/spec-parts';
import type { HovmollerData } from './index';

/** The spacing of latitude bands (the smallest gap between distinct latitudes). */
function latStep(cells: HovmollerData['cells']): number {
  const lats = [...new Set(cells.map((c) => c.lat))].sort((a, b) => a - b);
  let step = Infinity;
  for (let i = 1; i < lats.length; i++) step = Math.min(step, lats[i] - lats[i - 1]);
  return Number.isFinite(step) && step > 0 ? step : 1;
}

/** A time–latitude diagram: one cell per month and latitude band, diverging colours centred on zero (red above, blue below). */
export function hovmollerSpec(data: HovmollerData, _ctx?: SpecContext): FigureSpec {
  const half = latStep(data.cells) / 2;
  const values = data.cells.map((c) => ({ ...c, from: monthStart(c.month), to: monthAfter(c.month), south: c.lat - half, north: c.lat + half }));
  const { show } = data;
  return {
    $schema: SCHEMA,
    width: 'container',
    height: 300,
    data: { values },
    mark: { type: 'rect' },
    encoding: {
      x: { field: 'from', type: 'temporal', title: 'Month' },
      x2: { field: 'to' },
      y: { field: 'south', type: 'quantitative', title: 'Latitude (degrees north; negative is south)' },
      y2: { field: 'north' },
      color: {
        field: 'value',
        type: 'quantitative',
        scale: { scheme: 'redblue', reverse: true, domainMid: 0 },
        legend: { title: axisTitle(show === 'raw' ? 'Value' : 'Anomaly; red above zero, blue below', data.units), orient: 'bottom', gradientLength: 240 },
      },
    },
    config: BASE_CONFIG,
  } as FigureSpec;
}

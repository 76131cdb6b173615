import type { FigureRecipe } from '../../api/figures';
import type { FigureSpec } from './spec-type';
import type { ScatterPlotData } from '../figure-data';
import { formatValue } from '../format';
import { ACCENT, axisTitle, BASE_CONFIG, INK, SCHEMA } from './common';

/** Index against carbon anomaly, one point per month, with the least-squares line and r² in the title. */
export function scatterSpec(data: ScatterPlotData, recipe?: FigureRecipe): FigureSpec {
  const lag = recipe && 'lag' in recipe && recipe.lag !== undefined ? recipe.lag : 0;
  const points = data.points.filter((p) => p.x !== null && p.y !== null);
  const xs = points.map((p) => p.x as number);
  const layers: unknown[] = [
    {
      data: { values: points },
      mark: { type: 'point', filled: true, size: 18, opacity: 0.55, color: ACCENT },
      encoding: {
        x: { field: 'x', type: 'quantitative', title: axisTitle(`${data.xName ?? 'Index'} anomaly`, data.xUnits), scale: { zero: false } },
        y: { field: 'y', type: 'quantitative', title: axisTitle(`${data.yName ?? 'Carbon'} anomaly`, data.yUnits), scale: { zero: false } },
      },
    },
  ];
  let title = 'No fit: too few months with both values';
  if (data.fit && xs.length > 0) {
    const { slope, intercept } = data.fit;
    const lo = Math.min(...xs);
    const hi = Math.max(...xs);
    layers.push({
      data: { values: [{ x: lo, y: intercept + slope * lo }, { x: hi, y: intercept + slope * hi }] },
      mark: { type: 'line', color: INK, strokeWidth: 1.5 },
      encoding: { x: { field: 'x', type: 'quantitative' }, y: { field: 'y', type: 'quantitative' } },
    });
    title = `r² = ${formatValue(data.fit.r2, 2)}, slope ${formatValue(slope, 3)} (n = ${data.fit.n})`;
  }
  const lagText = lag === 0 ? 'same month' : lag > 0 ? `index leads by ${lag} months` : `index lags by ${-lag} months`;
  return {
    $schema: SCHEMA,
    width: 'container',
    height: 280,
    layer: layers,
    title: { text: title, subtitle: `Least-squares line; ${lagText}` },
    config: BASE_CONFIG,
  } as FigureSpec;
}

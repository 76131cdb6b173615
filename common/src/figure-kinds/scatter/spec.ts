import { formatValue } from '../../figures/format';
import type { SpecContext } from '../kind';
import type { FigureSpec } from '../shared/spec-type';
import { ACCENT, axisTitle, BASE_CONFIG, INK, SCHEMA } from '../shared/spec-parts';
import type { ScatterData } from './index';

/** Index against carbon anomaly, one point per month, with the least-squares line and r² in the title. */
export function scatterSpec(data: ScatterData, ctx?: SpecContext): FigureSpec {
  const { lag } = data;
  // The index is bound first, the series second.
  const xName = ctx?.used[0]?.name ?? 'Index';
  const yName = ctx?.used[1]?.name ?? 'Carbon';
  const points = data.points.filter((p) => p.x !== null && p.y !== null);
  const xs = points.map((p) => p.x as number);
  const layers: unknown[] = [
    {
      data: { values: points },
      mark: { type: 'point', filled: true, size: 18, opacity: 0.55, color: ACCENT },
      encoding: {
        x: { field: 'x', type: 'quantitative', title: axisTitle(`${xName} anomaly`, data.xUnits), scale: { zero: false } },
        y: { field: 'y', type: 'quantitative', title: axisTitle(`${yName} anomaly`, data.yUnits), scale: { zero: false } },
      },
    },
  ];
  let title = 'No fit: too few months with both values';
  const { slope, intercept } = data.fit;
  if (slope !== null && intercept !== null && xs.length > 0) {
    const lo = Math.min(...xs);
    const hi = Math.max(...xs);
    layers.push({
      data: { values: [{ x: lo, y: intercept + slope * lo }, { x: hi, y: intercept + slope * hi }] },
      mark: { type: 'line', color: INK, strokeWidth: 1.5 },
      encoding: { x: { field: 'x', type: 'quantitative' }, y: { field: 'y', type: 'quantitative' } },
    });
    title = `r² = ${data.fit.r2 === null ? 'n/a' : formatValue(data.fit.r2, 2)}, slope ${formatValue(slope, 3)} (n = ${data.fit.n})`;
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

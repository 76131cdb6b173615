import { formatValue } from '../../figures/format';
import type { SpecContext } from '../kind';
import type { FigureSpec } from '../shared/spec-type';
import { ACCENT, BASE_CONFIG, MUTED, SCHEMA, WARM } from '../shared/spec-parts';
import type { LagCorrelationData } from './index';

/**
 * Correlation r against lag as bars, the significance threshold drawn as
 * rules at ±threshold for every lag (it varies with the effective sample
 * size), and the strongest lag marked and labelled.
 */
export function lagCorrelationSpec(data: LagCorrelationData, _ctx?: SpecContext): FigureSpec {
  const { method, alpha } = data;
  const values = data.lags.map((l) => ({
    ...l,
    from: l.lag - 0.45,
    to: l.lag + 0.45,
    barFrom: l.lag - 0.35,
    barTo: l.lag + 0.35,
    negThreshold: l.threshold === null ? null : -l.threshold,
    beyond: l.r !== null && l.threshold !== null && Math.abs(l.r) >= l.threshold ? 'beyond threshold' : 'within threshold',
  }));
  const x = { field: 'lag', type: 'quantitative', title: 'Lag (months; positive: the index leads)', axis: { tickMinStep: 1 } };
  const yTitle = `Correlation r, ${method === 'spearman' ? 'Spearman' : 'Pearson'} (dimensionless)`;
  const layers: unknown[] = [
    { mark: { type: 'rule', color: '#9aa0a3', strokeWidth: 0.75 }, encoding: { y: { datum: 0 } } },
    {
      mark: { type: 'bar' },
      encoding: {
        x: { ...x, field: 'barFrom' },
        x2: { field: 'barTo' },
        y: { field: 'r', type: 'quantitative', title: yTitle, scale: { domain: [-1, 1] } },
        y2: { datum: 0 },
        color: {
          field: 'beyond',
          type: 'nominal',
          scale: { domain: ['beyond threshold', 'within threshold'], range: [ACCENT, '#c9c4b8'] },
          legend: { title: `|r| against the pointwise p = ${alpha} threshold` },
        },
      },
    },
    {
      mark: { type: 'rule', color: WARM, strokeDash: [4, 3], strokeWidth: 1.25 },
      encoding: { x: { field: 'from', type: 'quantitative' }, x2: { field: 'to' }, y: { field: 'threshold', type: 'quantitative' } },
    },
    {
      mark: { type: 'rule', color: WARM, strokeDash: [4, 3], strokeWidth: 1.25 },
      encoding: { x: { field: 'from', type: 'quantitative' }, x2: { field: 'to' }, y: { field: 'negThreshold', type: 'quantitative' } },
    },
  ];
  if (data.strongest && data.strongest.r !== null) {
    const s = { lag: data.strongest.lag, r: data.strongest.r };
    const label = `strongest: r = ${formatValue(s.r, 2)} at lag ${formatValue(s.lag, 0)}`;
    const mark = [{ lag: s.lag, r: s.r, label }];
    layers.push(
      { data: { values: mark }, mark: { type: 'point', shape: 'diamond', filled: true, size: 70, color: MUTED, stroke: '#1d2326' }, encoding: { x: { field: 'lag', type: 'quantitative' }, y: { field: 'r', type: 'quantitative' } } },
      {
        data: { values: mark },
        mark: { type: 'text', fontSize: 11, fontWeight: 600, dy: s.r >= 0 ? -12 : 12, align: 'center' },
        encoding: { x: { field: 'lag', type: 'quantitative' }, y: { field: 'r', type: 'quantitative' }, text: { field: 'label' } },
      },
    );
  }
  return {
    $schema: SCHEMA,
    width: 'container',
    height: 240,
    data: { values },
    layer: layers,
    title: { text: `Dashed red rules: ±pointwise threshold for p = ${alpha} (effective sample size, each lag alone)`, fontSize: 11 },
    config: BASE_CONFIG,
  } as FigureSpec;
}

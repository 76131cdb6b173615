import { describe, expect, it } from 'vitest';
import { compile } from 'vega-lite';
import { figureSvg, exportName } from './exports';
import { budgetSpec, compositeSpec, hovmollerSpec, lagCorrelationSpec, scatterSpec, seasonalCycleSpec, timeseriesSpec } from '@upwell/common';

const specs = {
  timeseries: timeseriesSpec({
    points: [{ month: '1997-01', value: 0.1 }, { month: '1997-02', value: 0.3 }],
    events: [{ phase: 'warm', start: '1997-01', peak: '1997-01', end: '1997-02' }],
    units: 'Pg C',
    show: 'anomaly',
  }),
  'seasonal-cycle': seasonalCycleSpec({ months: [{ month: 1, mean: 1, sd: 0.1, min: 0.8, max: 1.2, n: 30 }], units: 'Pg C' }),
  'lag-correlation': lagCorrelationSpec({ lags: [{ lag: 0, r: 0.5, n: 100, nEff: 30, p: 0.01, threshold: 0.36 }], strongest: { lag: 0, r: 0.5, p: 0.01 } }),
  composite: compositeSpec({ offsets: [0, 1], mean: [1, 2], lower: [0, 1], upper: [2, 3], n: [2, 2], members: [{ at: '1997-12', values: [1, 2] }], units: 'Pg C' }),
  budget: budgetSpec({ months: ['2000-01'], terms: [{ name: 'biology', values: [1] }], tendency: [1], residual: [0], rmsResidual: 0, relativeResidual: 0, units: 'Pg C yr⁻¹' }),
  hovmoller: hovmollerSpec({ cells: [{ month: '2000-01', lat: 0, value: 1 }, { month: '2000-01', lat: 2, value: -1 }], units: 'µmol kg⁻¹' }),
  scatter: scatterSpec({ points: [{ x: 0, y: 1, month: '2000-01' }, { x: 1, y: 2, month: '2000-02' }], fit: { slope: 1, intercept: 1, r2: 1, n: 2 }, xUnits: '°C', yUnits: 'Pg C' }),
};

describe('every spec is valid vega-lite', () => {
  for (const [kind, spec] of Object.entries(specs)) {
    it(`${kind} compiles without warnings`, () => {
      const warnings: string[] = [];
      const logger = { level: () => logger, warn: (...m: unknown[]) => (warnings.push(m.join(' ')), logger), info: () => logger, debug: () => logger, error: (...m: unknown[]) => { throw new Error(m.join(' ')); } };
      compile({ ...(spec as object), width: 600 } as Parameters<typeof compile>[0], { logger: logger as never });
      expect(warnings).toEqual([]);
    });
  }
});

describe('figure exports', () => {
  it('renders a figure to SVG off screen with its axis titles', async () => {
    const svg = await figureSvg(specs['lag-correlation']);
    expect(svg.startsWith('<svg')).toBe(true);
    expect(svg).toContain('Correlation r, Pearson (dimensionless)');
    expect(svg).toContain('strongest: r = 0.50 at lag 0');
  });

  for (const [kind, spec] of Object.entries(specs)) {
    it(`${kind} renders through the expression interpreter (no eval)`, async () => {
      expect(await figureSvg(spec)).toMatch(/^<svg[\s\S]*<\/svg>$/);
    });
  }

  it('names files by figure number and kind', () => {
    expect(exportName(3, 'Time–latitude diagram')).toBe('figure-3-time-latitude-diagram');
    expect(exportName(null, 'Event table')).toBe('event-table');
  });
});

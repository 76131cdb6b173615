import { describe, expect, it } from 'vitest';
import { compile } from 'vega-lite';
import { figureSvg, exportName } from './exports';
import { budgetSpec, compositeSpec, hovmollerSpec, lagCorrelationSpec, scatterSpec, seasonalCycleSpec, timeseriesSpec } from '@upwell/common';

// Inputs in each kind's result shape, as the server sends them.
const fit = { slope: 1, intercept: 1, slopeStdErr: null, r2: 1, n: 2 };
const specs = {
  timeseries: timeseriesSpec({
    points: [{ month: '1997-01', value: 0.1 }, { month: '1997-02', value: 0.3 }],
    events: [{ phase: 'warm', start: '1997-01', peak: '1997-01', end: '1997-02', months: 2, peakValue: 0.3, strength: 'weak', label: '' }],
    units: 'Pg C',
    show: 'anomaly',
    trend: { perDecade: null, perDecadeStdErr: null, r2: null, n: 2 },
  }),
  'seasonal-cycle': seasonalCycleSpec({ months: [{ month: 1, name: 'Jan', mean: 1, sd: 0.1, min: 0.8, max: 1.2, n: 30, years: 30 }], units: 'Pg C', base: { from: '1991-01', to: '2020-12' } }),
  'lag-correlation': lagCorrelationSpec({
    method: 'pearson',
    alpha: 0.05,
    lags: [{ lag: 0, r: 0.5, n: 100, nEff: 30, p: 0.01, threshold: 0.36 }],
    strongest: { lag: 0, r: 0.5, n: 100, nEff: 30, p: 0.01, threshold: 0.36 },
  }),
  composite: compositeSpec({
    phase: 'warm',
    confidence: 0.95,
    events: [],
    offsets: [{ offset: 0, mean: 1, lower: 0, upper: 2, n: 2 }, { offset: 1, mean: 2, lower: 1, upper: 3, n: 2 }],
    members: [{ event: '1997-12', offset: 0, value: 1 }, { event: '1997-12', offset: 1, value: 2 }],
    units: 'Pg C',
  }),
  budget: budgetSpec({
    termNames: ['biology'],
    months: [{ month: '2000-01', tendency: 1, sumOfTerms: 1, residual: 0 }],
    terms: [{ month: '2000-01', term: 'biology', value: 1 }],
    rmsResidual: 0,
    relativeResidual: 0,
    units: 'Pg C yr⁻¹',
  }),
  hovmoller: hovmollerSpec({ show: 'anomaly', latitudes: [0, 2], cells: [{ month: '2000-01', lat: 0, value: 1 }, { month: '2000-01', lat: 2, value: -1 }], units: 'µmol kg⁻¹' }),
  scatter: scatterSpec({ lag: 0, points: [{ x: 0, y: 1, month: '2000-01' }, { x: 1, y: 2, month: '2000-02' }], fit, line: [], xUnits: '°C', yUnits: 'Pg C' }),
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

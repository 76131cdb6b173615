import { describe, expect, it } from 'vitest';
import { BUDGET_COLOURS } from '../figures/budget-colours';
import { result, used } from '../../test-fixtures/figure-results';
import { budgetSpec } from './budget/spec';
import { COLD, NO_UNITS, WARM } from './shared/spec-parts';
import { compositeSpec } from './composite/spec';
import { hovmollerSpec } from './hovmoller/spec';
import { figureTable, specForResult } from './registry';
import { lagCorrelationSpec } from './lag-correlation/spec';
import { scatterSpec } from './scatter/spec';
import { seasonalCycleSpec } from './seasonal-cycle/spec';
import { timeseriesSpec } from './timeseries/spec';
import type { FigureEvent } from './shared/result-parts';

// The inputs are the kinds' result shapes, as the server sends them (before the one-shape change
// these tests fed column-shaped "plot data"; what each test checks of the spec is unchanged).
const event = (phase: 'warm' | 'cold', start: string, peak: string, end: string): FigureEvent => ({ phase, start, peak, end, months: 0, peakValue: null, strength: null, label: '' });
const noTrend = { perDecade: null, perDecadeStdErr: null, r2: null, n: 0 };

type Layer = { mark: { type: string; [k: string]: unknown }; encoding?: Record<string, Record<string, unknown>>; data?: { values: Record<string, unknown>[] }; transform?: unknown[] };
const layers = (spec: unknown) => (spec as { layer: Layer[] }).layer;
const ofType = (spec: unknown, type: string) => layers(spec).filter((l) => l.mark.type === type);

describe('timeseries spec', () => {
  const spec = timeseriesSpec({
    points: [
      { month: '1997-01', value: -0.2 },
      { month: '1997-02', value: null },
      { month: '1997-03', value: 0.4 },
    ],
    events: [event('warm', '1997-05', '1997-12', '1998-04'), event('cold', '1998-08', '1999-01', '1999-06')],
    units: 'Pg C',
    show: 'anomaly',
    trend: noTrend,
  });

  it('shades each event behind the line, warm in red and cold in blue, with a legend', () => {
    const [rect] = ofType(spec, 'rect');
    expect(layers(spec).indexOf(rect)).toBeLessThan(layers(spec).indexOf(ofType(spec, 'line')[0]));
    expect(rect.encoding!.color.scale).toEqual({ domain: ['warm', 'cold'], range: [WARM, COLD] });
    expect(rect.encoding!.color.legend).toBeTruthy();
    // The last month of an event is covered: it ends at the start of the month after.
    expect(rect.data!.values[0]).toMatchObject({ start: '1997-05-01', end: '1998-05-01' });
  });

  it('labels every event with its phase in text, so colour is not the only cue', () => {
    const [text] = ofType(spec, 'text');
    expect(text.encoding!.text).toEqual({ field: 'label' });
    expect(text.data!.values.map((v) => v.label)).toEqual(['warm', 'cold']);
  });

  it('puts units on the y axis and keeps gaps as nulls', () => {
    const [line] = ofType(spec, 'line');
    expect(line.encoding!.y.title).toBe('Series anomaly (Pg C)');
    expect(line.encoding!.x.title).toBe('Month');
    expect(line.data!.values[1].value).toBeNull();
  });

  it('draws no event layers when there are no events, and says when units are missing', () => {
    const bare = timeseriesSpec({ points: [{ month: '2000-01', value: 1 }], events: [], units: '', show: 'raw', trend: noTrend });
    expect(ofType(bare, 'rect')).toHaveLength(0);
    expect(ofType(bare, 'line')[0].encoding!.y.title).toBe(`Series (${NO_UNITS})`);
  });
});

describe('lag-correlation spec', () => {
  const data = {
    method: 'spearman' as const,
    alpha: 0.05,
    lags: [-1, 0, 1, 2].map((lag) => ({ lag, r: [0.1, 0.3, 0.62, 0.2][lag + 1], n: 300, nEff: 40, p: 0.01, threshold: 0.31 })),
    strongest: { lag: 1, r: 0.62, n: 300, nEff: 40, p: 0.001, threshold: 0.31 },
  };
  const spec = lagCorrelationSpec(data);

  it('draws r as bars against lag with a dimensionless y axis naming the method', () => {
    const [bar] = ofType(spec, 'bar');
    expect(bar.encoding!.x.field).toBe('barFrom');
    expect(bar.encoding!.x2.field).toBe('barTo');
    expect(bar.encoding!.x.title).toMatch(/months/);
    expect(bar.encoding!.y.field).toBe('r');
    expect(bar.encoding!.y.title).toMatch(/Spearman.*dimensionless/);
  });

  it('draws the threshold as rules at +threshold and −threshold', () => {
    const rules = ofType(spec, 'rule').filter((l) => l.encoding?.y && 'field' in l.encoding.y);
    expect(rules.map((r) => r.encoding!.y.field).sort()).toEqual(['negThreshold', 'threshold']);
    const values = (spec as { data: { values: Record<string, number>[] } }).data.values;
    expect(values.every((v) => v.negThreshold === -0.31 && v.threshold === 0.31)).toBe(true);
  });

  it('labels the threshold pointwise in the legend and the caption (issue 14: each lag tested alone, Wilks 2016 BAMS)', () => {
    const text = JSON.stringify(spec);
    expect(text).toContain('|r| against the pointwise p = 0.05 threshold');
    expect(text).toContain('±pointwise threshold for p = 0.05');
  });

  it('marks the strongest lag with a text label', () => {
    const [text] = ofType(spec, 'text');
    expect(text.data!.values[0]).toMatchObject({ lag: 1, r: 0.62, label: 'strongest: r = 0.62 at lag 1' });
  });

  it('has no strongest-lag label when no correlation is defined', () => {
    expect(ofType(lagCorrelationSpec({ method: 'pearson', alpha: 0.05, lags: [], strongest: null }), 'text')).toHaveLength(0);
  });
});

describe('composite spec', () => {
  const member = (event: string, values: (number | null)[]) => values.map((value, i) => ({ event, offset: i - 1, value }));
  const spec = compositeSpec({
    phase: 'cold',
    confidence: 0.9,
    events: [],
    offsets: [
      { offset: -1, mean: 0.1, lower: 0, upper: 0.2, n: 3 },
      { offset: 0, mean: 0.5, lower: 0.3, upper: 0.7, n: 3 },
      { offset: 1, mean: 0.2, lower: 0, upper: 0.4, n: 3 },
    ],
    members: [...member('1997-12', [0.1, 0.6, 0.3]), ...member('2015-12', [0.2, 0.4, null])],
    units: 'mol m⁻²',
  });

  it('draws members as thin grey lines, one per event', () => {
    const members = ofType(spec, 'line').find((l) => l.encoding!.detail)!;
    expect(members.mark.color).toBe('#b5b5b5');
    expect(members.mark.strokeWidth as number).toBeLessThan(1);
    expect(new Set(members.data!.values.map((v) => v.member))).toEqual(new Set(['1997-12', '2015-12']));
  });

  it('draws the confidence band as an area from lower to upper and the mean line in the phase colour', () => {
    const [area] = ofType(spec, 'area');
    expect(area.encoding!.y.field).toBe('lower');
    expect(area.encoding!.y2.field).toBe('upper');
    const mean = ofType(spec, 'line').find((l) => l.encoding!.y.field === 'mean')!;
    expect(mean.mark.color).toBe(COLD);
    expect(mean.encoding!.y.title).toBe('Composite anomaly, cold events (mol m⁻²)');
    expect(JSON.stringify(spec)).toContain('90% confidence band');
  });
});

describe('budget spec', () => {
  const spec = budgetSpec({
    termNames: ['advection', 'Air-sea flux'],
    months: [
      { month: '2000-01', tendency: 0.4, sumOfTerms: 0.5, residual: -0.1 },
      { month: '2000-02', tendency: 2.6, sumOfTerms: 2.5, residual: 0.1 },
    ],
    terms: [
      { month: '2000-01', term: 'advection', value: 1 },
      { month: '2000-02', term: 'advection', value: 2 },
      { month: '2000-01', term: 'Air-sea flux', value: -0.5 },
      { month: '2000-02', term: 'Air-sea flux', value: 0.5 },
    ],
    rmsResidual: 0.1,
    relativeResidual: 0.05,
    units: 'Tg C month⁻¹',
  });

  it('stacks the terms as bars with the fixed colour of each term', () => {
    const [bar] = ofType(spec, 'bar');
    expect(bar.encoding!.y.stack).toBe('zero');
    expect(bar.encoding!.y.title).toBe('Rate of change (Tg C month⁻¹)');
    const scale = bar.encoding!.color.scale as { domain: string[]; range: string[] };
    expect(scale.domain).toEqual(['advection', 'Air-sea flux', 'tendency', 'residual']);
    expect(scale.range).toEqual([BUDGET_COLOURS.advection, BUDGET_COLOURS['air–sea flux'], BUDGET_COLOURS.tendency, BUDGET_COLOURS.residual]);
  });

  it('draws the tendency as a solid line and the residual as a dashed line', () => {
    const lines = ofType(spec, 'line');
    expect(lines).toHaveLength(2);
    expect(lines[0].transform).toEqual([{ filter: "datum.term === 'tendency'" }]);
    expect(lines[1].transform).toEqual([{ filter: "datum.term === 'residual'" }]);
    expect(lines[1].mark.strokeDash).toBeTruthy();
    expect(JSON.stringify(spec)).toContain('RMS residual 0.100 Tg C month⁻¹ (5% of the tendency)');
  });
});

describe('hovmöller spec', () => {
  const spec = hovmollerSpec({
    show: 'anomaly',
    latitudes: [-5, 0, 5],
    cells: [
      { month: '2000-01', lat: -5, value: -1 },
      { month: '2000-01', lat: 0, value: 0.5 },
      { month: '2000-02', lat: 5, value: 2 },
    ],
    units: 'µmol kg⁻¹',
  }) as unknown as { mark: { type: string }; encoding: Record<string, Record<string, unknown>>; data: { values: Record<string, number>[] } };

  it('is a rect heatmap with a diverging scheme centred on zero and units in the legend', () => {
    expect(spec.mark.type).toBe('rect');
    expect(spec.encoding.color.scale).toMatchObject({ scheme: 'redblue', domainMid: 0 });
    expect(String((spec.encoding.color.legend as { title: string }).title)).toContain('µmol kg⁻¹');
    expect(spec.encoding.y.title).toMatch(/Latitude \(degrees north/);
  });

  it('gives each cell its latitude band from the data spacing', () => {
    expect(spec.data.values[0]).toMatchObject({ south: -7.5, north: -2.5 });
  });
});

describe('scatter spec', () => {
  // The server sends only months with both values; the spec still drops any pair with a gap.
  const data = {
    lag: 3,
    points: [
      { x: -1, y: -2, month: '2000-01' },
      { x: 2, y: 3, month: '2000-02' },
      { x: null as unknown as number, y: 1, month: '2000-03' },
    ],
    fit: { slope: 1.5, intercept: -0.5, slopeStdErr: null, r2: 0.8123, n: 2 },
    line: [],
    xUnits: '°C',
    yUnits: 'Pg C',
  };
  const ctx = { used: [used({ name: 'Index' }), used({ name: 'DIC' })] };
  const spec = scatterSpec(data, ctx);

  it('puts r² in the title and the regression line across the x range', () => {
    expect((spec as { title: { text: string; subtitle: string } }).title.text).toBe('r² = 0.81, slope 1.500 (n = 2)');
    expect((spec as { title: { subtitle: string } }).title.subtitle).toContain('index leads by 3 months');
    const [line] = ofType(spec, 'line');
    expect(line.data!.values).toEqual([
      { x: -1, y: -2 },
      { x: 2, y: 2.5 },
    ]);
  });

  it('plots only months with both values, with units on both axes', () => {
    const [pts] = ofType(spec, 'point');
    expect(pts.data!.values).toHaveLength(2);
    expect(pts.encoding!.x.title).toBe('Index anomaly (°C)');
    expect(pts.encoding!.y.title).toBe('DIC anomaly (Pg C)');
  });

  it('draws no line without a fit', () => {
    expect(ofType(scatterSpec({ ...data, fit: { slope: null, intercept: null, slopeStdErr: null, r2: null, n: 0 } }, ctx), 'line')).toHaveLength(0);
  });
});

describe('seasonal-cycle spec', () => {
  const spec = seasonalCycleSpec({
    months: Array.from({ length: 12 }, (_, i) => ({ month: i + 1, name: '', mean: i, sd: 1, min: i - 2, max: i + 2, n: 30, years: 30 })),
    units: 'Pg C',
    base: { from: '1991-01', to: '2020-12' },
  });
  it('plots the mean over calendar months in order, with a ±1 sd band and the range', () => {
    const [line] = ofType(spec, 'line');
    expect(line.encoding!.x.sort).toEqual(['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec']);
    expect(line.encoding!.y.title).toBe('Monthly mean (Pg C)');
    const band = ofType(spec, 'bar')[0];
    expect(band.encoding!.y.field).toBe('low');
    expect((spec as { data: { values: { low: number; high: number }[] } }).data.values[3]).toMatchObject({ low: 2, high: 4 });
  });
});

describe('specForResult', () => {
  it('draws a result through its kind’s spec, with units from the data, and gives no chart for the event table', () => {
    const r = result('timeseries', { points: [{ month: '2000-01', value: 1 }], events: [], units: 'mmol m⁻³', show: 'raw', trend: noTrend });
    expect(JSON.stringify(specForResult(r))).toContain('(mmol m⁻³)');
    expect(specForResult(result('event-table', { carbonSeries: [], rows: [] }))).toBeNull();
  });

  it('names the scatter axes after the index (x) and the series (y) used', () => {
    const data = { lag: 0, points: [], fit: { slope: null, intercept: null, slopeStdErr: null, r2: null, n: 0 }, line: [], xUnits: '°C', yUnits: 'Pg C' };
    const spec = JSON.stringify(specForResult(result('scatter', data, { used: [used({ units: '°C', name: 'Index' }), used({ name: 'DIC' })] })));
    expect(spec).toContain('Index anomaly (°C)');
    expect(spec).toContain('DIC anomaly (Pg C)');
  });
});

describe('figureTable (CSV rows of each kind)', () => {
  it('composite: one column per event, one row per offset', () => {
    const data = {
      phase: 'warm', units: 'Pg C/yr', confidence: 0.95, events: [],
      offsets: [{ offset: -1, mean: 0.1, lower: null, upper: null, n: 1 }, { offset: 0, mean: -0.3, lower: -0.5, upper: -0.1, n: 2 }],
      members: [{ event: '1997-12', offset: -1, value: 0.1 }, { event: '1997-12', offset: 0, value: -0.4 }, { event: '2015-11', offset: 0, value: -0.2 }],
    };
    const t = figureTable(result('composite', data));
    expect(t.header).toEqual(['offset', 'mean (Pg C/yr)', 'lower', 'upper', 'n', 'event peaking 1997-12', 'event peaking 2015-11']);
    expect(t.rows).toEqual([[-1, 0.1, null, null, 1, 0.1, null], [0, -0.3, -0.5, -0.1, 2, -0.4, -0.2]]);
  });

  it('event table: each carbon series’ change in Pg C beside the event', () => {
    const data = {
      carbonSeries: [{ seriesId: 'c', name: 'Flux', units: 'Pg C/yr', treatment: 'rate-integrated' }],
      rows: [{ ...event('cold', '1988-05', '1988-12', '1989-05'), months: 13, peakValue: -1.9, strength: 'strong', carbon: { c: 0.42 } }],
    };
    const t = figureTable(result('event-table', data));
    expect(t.header.at(-1)).toBe('Flux (Pg C)');
    expect(t.rows[0]).toEqual(['cold', '1988-05', '1988-12', '1989-05', 13, -1.9, 'strong', 0.42]);
  });

  it('budget: one column per term, then tendency and residual', () => {
    const data = {
      units: 'Pg C/yr', termNames: ['advection', 'air–sea flux'], rmsResidual: 0.07, relativeResidual: 0.04,
      months: [{ month: '2000-01', tendency: 1, sumOfTerms: 0.9, residual: 0.1 }],
      terms: [{ month: '2000-01', term: 'advection', value: 0.5 }, { month: '2000-01', term: 'air–sea flux', value: 0.4 }],
    };
    const t = figureTable(result('budget', data));
    expect(t.header).toEqual(['month', 'advection (Pg C/yr)', 'air–sea flux (Pg C/yr)', 'tendency', 'residual']);
    expect(t.rows).toEqual([['2000-01', 0.5, 0.4, 1, 0.1]]);
  });
});

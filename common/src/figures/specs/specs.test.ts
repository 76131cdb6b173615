import { describe, expect, it } from 'vitest';
import { BUDGET_COLOURS } from '../budget-colours';
import { NO_UNITS, readFigureData } from '../figure-data';
import { result, used } from '../../../test-fixtures/figure-results';
import { budgetSpec } from './budget';
import { COLD, WARM } from './common';
import { compositeSpec } from './composite';
import { hovmollerSpec } from './hovmoller';
import { specForResult } from './index';
import { lagCorrelationSpec } from './lag-correlation';
import { scatterSpec } from './scatter';
import { seasonalCycleSpec } from './seasonal-cycle';
import { timeseriesSpec } from './timeseries';

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
    events: [
      { phase: 'warm', start: '1997-05', peak: '1997-12', end: '1998-04' },
      { phase: 'cold', start: '1998-08', peak: '1999-01', end: '1999-06' },
    ],
    units: 'Pg C',
    show: 'anomaly',
    name: 'DIC',
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
    expect(line.encoding!.y.title).toBe('DIC anomaly (Pg C)');
    expect(line.encoding!.x.title).toBe('Month');
    expect(line.data!.values[1].value).toBeNull();
  });

  it('draws no event layers when there are no events, and says when units are missing', () => {
    const bare = timeseriesSpec({ points: [{ month: '2000-01', value: 1 }], events: [], units: '', show: 'raw' });
    expect(ofType(bare, 'rect')).toHaveLength(0);
    expect(ofType(bare, 'line')[0].encoding!.y.title).toBe(`Series (${NO_UNITS})`);
  });
});

describe('lag-correlation spec', () => {
  const data = {
    lags: [-1, 0, 1, 2].map((lag) => ({ lag, r: [0.1, 0.3, 0.62, 0.2][lag + 1], n: 300, nEff: 40, p: 0.01, threshold: 0.31 })),
    strongest: { lag: 1, r: 0.62, p: 0.001 },
  };
  const spec = lagCorrelationSpec(data, { kind: 'lag-correlation', index: { seriesId: 'a' }, series: { seriesId: 'b' }, method: 'spearman', alpha: 0.05 });

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

  it('marks the strongest lag with a text label', () => {
    const [text] = ofType(spec, 'text');
    expect(text.data!.values[0]).toMatchObject({ lag: 1, r: 0.62, label: 'strongest: r = 0.62 at lag 1' });
  });

  it('has no strongest-lag label when no correlation is defined', () => {
    expect(ofType(lagCorrelationSpec({ lags: [], strongest: null }), 'text')).toHaveLength(0);
  });
});

describe('composite spec', () => {
  const spec = compositeSpec(
    {
      offsets: [-1, 0, 1],
      mean: [0.1, 0.5, 0.2],
      lower: [0, 0.3, 0],
      upper: [0.2, 0.7, 0.4],
      n: [3, 3, 3],
      members: [
        { at: '1997-12', values: [0.1, 0.6, 0.3] },
        { at: '2015-12', values: [0.2, 0.4, null] },
      ],
      units: 'mol m⁻²',
    },
    { kind: 'composite', index: { seriesId: 'a' }, series: { seriesId: 'b' }, phase: 'cold', confidence: 0.9 },
  );

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
    months: ['2000-01', '2000-02'],
    terms: [
      { name: 'advection', values: [1, 2] },
      { name: 'Air-sea flux', values: [-0.5, 0.5] },
    ],
    tendency: [0.4, 2.6],
    residual: [-0.1, 0.1],
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
  const data = {
    points: [
      { x: -1, y: -2, month: '2000-01' },
      { x: 2, y: 3, month: '2000-02' },
      { x: null, y: 1, month: '2000-03' },
    ],
    fit: { slope: 1.5, intercept: -0.5, r2: 0.8123, n: 2 },
    xUnits: '°C',
    yUnits: 'Pg C',
    xName: 'Index',
    yName: 'DIC',
  };
  const spec = scatterSpec(data, { kind: 'scatter', index: { seriesId: 'a' }, series: { seriesId: 'b' }, lag: 3 });

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
    expect(ofType(scatterSpec({ ...data, fit: null }), 'line')).toHaveLength(0);
  });
});

describe('seasonal-cycle spec', () => {
  const spec = seasonalCycleSpec({
    months: Array.from({ length: 12 }, (_, i) => ({ month: i + 1, mean: i, sd: 1, min: i - 2, max: i + 2, n: 30 })),
    units: 'Pg C',
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
  it('fills missing units from the versions used and gives no chart for the event table', () => {
    const r = result('timeseries', { points: [{ month: '2000-01', value: 1 }], events: [], show: 'raw' }, { used: [used({ units: 'mmol m⁻³' })] });
    const spec = specForResult({ kind: 'timeseries', series: { seriesId: 'a' } }, r);
    expect(JSON.stringify(spec)).toContain('(mmol m⁻³)');
    expect(specForResult({ kind: 'event-table', index: { seriesId: 'a' } }, result('event-table', { events: [] }))).toBeNull();
  });

  it('reads scatter units from the index (x) and the series (y)', () => {
    const d = readFigureData('scatter', result('scatter', { points: [], fit: null }, { used: [used({ units: '°C', name: 'Index' }), used({ units: 'Pg C' })] }));
    expect(d).toMatchObject({ xUnits: '°C', yUnits: 'Pg C', xName: 'Index' });
  });
});

import { describe, expect, it } from 'vitest';
import type { BudgetData, CompositeData, EventTableData, FigureResult } from '../api/figures';
import { readFigureData } from './figure-data';

const used: FigureResult['used'] = [
  { seriesId: 'i', name: 'Index', version: 1, units: 'K', origin: 'model-output', valuesSha256: 'x' },
  { seriesId: 'c', name: 'Flux', version: 2, units: 'Pg C/yr', origin: 'model-output', valuesSha256: 'y' },
];

describe('readFigureData reads the server’s record shapes into the columns the specs draw', () => {
  it('composite: offsets, mean, band and one member line per event', () => {
    const server: CompositeData = {
      phase: 'warm',
      units: 'Pg C/yr',
      confidence: 0.95,
      events: [
        { phase: 'warm', start: '1997-05', peak: '1997-12', end: '1998-05', months: 13, peakValue: 2.3, strength: 'very strong', label: '' },
        { phase: 'warm', start: '2015-03', peak: '2015-11', end: '2016-05', months: 15, peakValue: 2.6, strength: 'very strong', label: '' },
      ],
      offsets: [
        { offset: -1, mean: 0.1, lower: null, upper: null, n: 1 },
        { offset: 0, mean: -0.3, lower: -0.5, upper: -0.1, n: 2 },
      ],
      members: [
        { event: '1997-12', offset: -1, value: 0.1 },
        { event: '1997-12', offset: 0, value: -0.4 },
        { event: '2015-11', offset: 0, value: -0.2 },
      ],
    };
    const d = readFigureData('composite', { data: server as unknown as Record<string, unknown>, used });
    expect(d.offsets).toEqual([-1, 0]);
    expect(d.mean).toEqual([0.1, -0.3]);
    expect(d.lower).toEqual([null, -0.5]);
    expect(d.n).toEqual([1, 2]);
    expect(d.members).toEqual([
      { at: '1997-12', values: [0.1, -0.4] },
      { at: '2015-11', values: [null, -0.2] },
    ]);
  });

  it('event table: one row per event with each carbon series’ change in Pg C', () => {
    const server: EventTableData = {
      carbonSeries: [{ seriesId: 'c', name: 'Flux', units: 'Pg C/yr', treatment: 'rate-integrated' }],
      rows: [{ phase: 'cold', start: '1988-05', peak: '1988-12', end: '1989-05', months: 13, peakValue: -1.9, strength: 'strong', label: '', carbon: { c: 0.42 } }],
    };
    const d = readFigureData('event-table', { data: server as unknown as Record<string, unknown>, used });
    expect(d.events[0]).toMatchObject({ phase: 'cold', peak: '1988-12', strength: 'strong', carbon: [{ seriesId: 'c', name: 'Flux', PgC: 0.42 }] });
  });

  it('budget: month columns per term, tendency and residual', () => {
    const server: BudgetData = {
      units: 'Pg C/yr',
      termNames: ['advection', 'air–sea flux'],
      months: [
        { month: '2000-01', tendency: 1, sumOfTerms: 0.9, residual: 0.1 },
        { month: '2000-02', tendency: 2, sumOfTerms: 2, residual: 0 },
      ],
      terms: [
        { month: '2000-01', term: 'advection', value: 0.5 },
        { month: '2000-01', term: 'air–sea flux', value: 0.4 },
        { month: '2000-02', term: 'advection', value: 1.5 },
        { month: '2000-02', term: 'air–sea flux', value: 0.5 },
      ],
      rmsResidual: 0.07,
      relativeResidual: 0.04,
    };
    const d = readFigureData('budget', { data: server as unknown as Record<string, unknown>, used });
    expect(d.months).toEqual(['2000-01', '2000-02']);
    expect(d.terms).toEqual([
      { name: 'advection', values: [0.5, 1.5] },
      { name: 'air–sea flux', values: [0.4, 0.5] },
    ]);
    expect(d.tendency).toEqual([1, 2]);
    expect(d.residual).toEqual([0.1, 0]);
    expect(d.units).toBe('Pg C/yr');
  });
});

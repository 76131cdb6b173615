import { describe, expect, it } from 'vitest';
import { figureCsv, toCsv } from './csv';
import { result } from './test-data';

describe('figure data as CSV', () => {
  it('flattens a budget into one row per month with a column per term', () => {
    const csv = figureCsv(
      'budget',
      result('budget', {
        months: ['2000-01', '2000-02'],
        terms: [{ name: 'advection', values: [1, null] }, { name: 'biology', values: [-0.5, 0.25] }],
        tendency: [0.5, 0.3],
        residual: [0, null],
        rmsResidual: 0,
        relativeResidual: 0,
        units: 'Pg C yr⁻¹',
      }),
    );
    expect(csv).toBe('month,advection (Pg C yr⁻¹),biology (Pg C yr⁻¹),tendency,residual\r\n2000-01,1,-0.5,0.5,0\r\n2000-02,,0.25,0.3,\r\n');
  });

  it('gives composite members a column each and marks timeseries months inside events', () => {
    const composite = figureCsv('composite', result('composite', { offsets: [0], mean: [1], lower: [0], upper: [2], n: [2], members: [{ at: '1997-12', values: [1.5] }], units: 'Pg C' }));
    expect(composite.split('\r\n')[0]).toBe('offset,mean (Pg C),lower,upper,n,event peaking 1997-12');
    const ts = figureCsv('timeseries', result('timeseries', { points: [{ month: '1997-04', value: 1 }, { month: '1997-06', value: 2 }], events: [{ phase: 'warm', start: '1997-05', peak: '1997-12', end: '1998-04' }], units: 'Pg C', show: 'anomaly' }));
    expect(ts).toBe('month,value (Pg C),event\r\n1997-04,1,\r\n1997-06,2,warm\r\n');
  });

  it('quotes fields holding commas or quotes (RFC 4180)', () => {
    expect(toCsv(['name'], [['a, "b"']])).toBe('name\r\n"a, ""b"""\r\n');
  });
});

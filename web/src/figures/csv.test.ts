import { describe, expect, it } from 'vitest';
import { figureCsv, toCsv } from './csv';
import { result } from './test-data';

describe('figure data as CSV', () => {
  it('flattens a budget into one row per month with a column per term', () => {
    const csv = figureCsv(
      result('budget', {
        termNames: ['advection', 'biology'],
        months: [
          { month: '2000-01', tendency: 0.5, sumOfTerms: 0.5, residual: 0 },
          { month: '2000-02', tendency: 0.3, sumOfTerms: null, residual: null },
        ],
        terms: [
          { month: '2000-01', term: 'advection', value: 1 },
          { month: '2000-02', term: 'advection', value: null },
          { month: '2000-01', term: 'biology', value: -0.5 },
          { month: '2000-02', term: 'biology', value: 0.25 },
        ],
        rmsResidual: 0,
        relativeResidual: 0,
        units: 'Pg C yr⁻¹',
      }),
    );
    expect(csv).toBe('month,advection (Pg C yr⁻¹),biology (Pg C yr⁻¹),tendency,residual\r\n2000-01,1,-0.5,0.5,0\r\n2000-02,,0.25,0.3,\r\n');
  });

  it('gives composite members a column each and marks timeseries months inside events', () => {
    const composite = figureCsv(
      result('composite', { phase: 'warm', confidence: 0.95, events: [], offsets: [{ offset: 0, mean: 1, lower: 0, upper: 2, n: 2 }], members: [{ event: '1997-12', offset: 0, value: 1.5 }], units: 'Pg C' }),
    );
    expect(composite.split('\r\n')[0]).toBe('offset,mean (Pg C),lower,upper,n,event peaking 1997-12');
    const ts = figureCsv(
      result('timeseries', {
        points: [{ month: '1997-04', value: 1 }, { month: '1997-06', value: 2 }],
        events: [{ phase: 'warm', start: '1997-05', peak: '1997-12', end: '1998-04', months: 12, peakValue: null, strength: null, label: '' }],
        units: 'Pg C',
        show: 'anomaly',
        trend: { perDecade: null, perDecadeStdErr: null, r2: null, n: 0 },
      }),
    );
    expect(ts).toBe('month,value (Pg C),event\r\n1997-04,1,\r\n1997-06,2,warm\r\n');
  });

  it('quotes fields holding commas or quotes (RFC 4180)', () => {
    expect(toCsv(['name'], [['a, "b"']])).toBe('name\r\n"a, ""b"""\r\n');
  });
});

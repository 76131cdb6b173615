import { describe, expect, it } from 'vitest';
import { parseMonth } from '../series/month';
import { compositeMonths } from './composite-months';

describe('compositeMonths()', () => {
  const events = [
    { phase: 'warm' as const, start: '2001-06', peak: '2001-12', end: '2002-03' },
    { phase: 'warm' as const, start: '2002-05', peak: '2002-06', end: '2002-08' },
    { phase: 'cold' as const, start: '2003-01', peak: '2003-02', end: '2003-04' },
  ];

  it('takes the chosen offsets around each peak of the phase, each month once', () => {
    const m = compositeMonths(events, 'warm', [-1, 0, 1]);
    expect([...m.event].sort()).toEqual(['2001-11', '2001-12', '2002-01', '2002-05', '2002-06', '2002-07'].map(parseMonth));
    expect(m.events).toBe(2);
  });

  it('calls neutral only the months outside every event of either phase', () => {
    const m = compositeMonths(events, 'cold', [0]);
    expect(m.isNeutral(parseMonth('2002-04'))).toBe(true);
    expect(m.isNeutral(parseMonth('2002-03'))).toBe(false);
    expect(m.isNeutral(parseMonth('2003-03'))).toBe(false);
  });
});

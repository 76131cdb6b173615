import { describe, expect, it } from 'vitest';
import { parseMonth } from '../series/month';
import { mapWindow } from './map-window';

const source = { first: parseMonth('2000-01'), last: parseMonth('2009-12'), cells: 1, read: () => true };

describe('mapWindow()', () => {
  it('defaults to the whole field, the last month for anomaly-at, and says when the base is the whole field', () => {
    expect(mapWindow(source, { mode: 'mean' })).toMatchObject({ from: source.first, to: source.last, warnings: [] });
    const w = mapWindow(source, { mode: 'anomaly-at' });
    expect(w.from).toBe(source.last);
    expect(w.warnings[0]).toMatch(/no base period/);
  });

  it('clips the period to the field and refuses periods that end first or miss the field', () => {
    expect(mapWindow(source, { mode: 'mean', period: { from: '1990-01', to: '2001-06' } })).toMatchObject({ from: source.first, to: parseMonth('2001-06') });
    expect(() => mapWindow(source, { mode: 'mean', period: { from: '2001-06', to: '2001-01' } })).toThrow(/before it starts/);
    expect(() => mapWindow(source, { mode: 'mean', period: { from: '2011-01', to: '2012-01' } })).toThrow(/does not overlap/);
    expect(() => mapWindow(source, { mode: 'anomaly-at', base: { from: '2005-01', to: '2004-01' } })).toThrow(/base period ends/);
  });
});

import { describe, expect, it } from 'vitest';
import { decodeCfTime } from './decode-cf-time';
import { monthKey } from './month-key';
import { monthlyAxis } from './monthly-axis';

const mid = (days: number[], calendar = 'standard') => decodeCfTime(days, 'days since 2000-01-01', calendar);

describe('monthKey()', () => {
  it('formats YYYY-MM with padding', () => {
    expect(monthKey({ year: 2000, month: 2 })).toBe('2000-02');
    expect(monthKey({ year: 850, month: 12 })).toBe('0850-12');
  });
});

describe('monthlyAxis()', () => {
  it('maps mid-month times to consecutive slots starting at the first month', () => {
    const axis = monthlyAxis(mid([15.5, 45, 74.5, 105]));
    expect(axis.start).toBe('2000-01');
    expect(axis.length).toBe(4);
    expect(Array.from(axis.slotOfStep)).toEqual([0, 1, 2, 3]);
    expect(axis.gaps).toEqual([]);
  });

  it('crosses a year boundary', () => {
    const axis = monthlyAxis(mid([349.5, 380.5], 'standard'));
    expect(axis.start).toBe('2000-12');
    expect(axis.length).toBe(2);
  });

  it('works in 360_day, where every month is 30 days', () => {
    const axis = monthlyAxis(mid([15, 45, 75, 105, 135, 165, 195, 225, 255, 285, 315, 345, 375], '360_day'));
    expect(axis.length).toBe(13);
  });

  it('accepts a single value', () => {
    expect(monthlyAxis(mid([15])).length).toBe(1);
  });

  it('refuses two values in one month, naming both indexes and dates', () => {
    expect(() => monthlyAxis(mid([15, 45, 50]), { variable: 'time' })).toThrow(/index 1 \(2000-02-15 00:00:00\) and index 2 \(2000-02-20 00:00:00\) fall in the same month 2000-02/);
  });

  it('refuses a daily axis (two days in one month)', () => {
    expect(() => monthlyAxis(mid([0, 1, 2]))).toThrow(/same month 2000-01/);
  });

  it('refuses months out of order', () => {
    expect(() => monthlyAxis(mid([45, 15]))).toThrow(/index 1 \(2000-01-16 00:00:00\) comes after index 0.*earlier/);
  });

  it('refuses a skipped month by default and names the first missing one', () => {
    expect(() => monthlyAxis(mid([15, 75]))).toThrow(/skips 1 month\(s\).*first missing: 2000-02/);
  });

  it('with allowGaps, leaves skipped months as empty slots and lists them', () => {
    const axis = monthlyAxis(mid([15, 105]), { allowGaps: true });
    expect(axis.length).toBe(4);
    expect(Array.from(axis.slotOfStep)).toEqual([0, 3]);
    expect(axis.gaps).toEqual(['2000-02', '2000-03']);
  });

  it('refuses an empty axis', () => {
    expect(() => monthlyAxis([])).toThrow(/no values/);
  });
});

import { describe, expect, it } from 'vitest';
import { decodeCfTime } from './decode-cf-time';
import { stampedAtMonthStarts } from './stamped-at-month-starts';

describe('stampedAtMonthStarts()', () => {
  // Day numbers of the first of each month in "days since 2000-01-01", standard calendar: 0, 31, 60, 91 (2000 is a leap year; CF 1.11 §4.4).
  it('is true for stamps at 00:00 on the 1st of each month, false for mid-month stamps or a time of day', () => {
    expect(stampedAtMonthStarts(decodeCfTime([0, 31, 60, 91], 'days since 2000-01-01', 'standard'))).toBe(true);
    expect(stampedAtMonthStarts(decodeCfTime([15.5, 45, 74.5], 'days since 2000-01-01', 'standard'))).toBe(false);
    expect(stampedAtMonthStarts(decodeCfTime([0, 31.5], 'days since 2000-01-01', 'standard'))).toBe(false);
    // 360_day: every month starts on a multiple of 30 days.
    expect(stampedAtMonthStarts(decodeCfTime([0, 30, 60], 'days since 2000-01-01', '360_day'))).toBe(true);
    expect(stampedAtMonthStarts([])).toBe(false);
  });
});

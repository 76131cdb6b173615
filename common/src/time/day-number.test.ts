import { describe, expect, it } from 'vitest';
import { dateFromDayNumber } from './date-from-day-number';
import { dayNumber } from './day-number';
import type { CfCalendar } from './types';

describe('dayNumber() and dateFromDayNumber()', () => {
  it('give the Julian Day Number of real dates (JDN 2451545 = 2000-01-01 Gregorian; 2299161 = 1582-10-15; 2299160 = 1582-10-04 Julian — Explanatory Supplement)', () => {
    expect(dayNumber(2000, 1, 1, 'proleptic_gregorian')).toBe(2451545);
    expect(dayNumber(1582, 10, 15, 'standard')).toBe(2299161);
    expect(dayNumber(1582, 10, 4, 'standard')).toBe(2299160);
    expect(dayNumber(1582, 10, 4, 'julian')).toBe(2299160);
  });

  it('invert each other over several centuries in every calendar', () => {
    const calendars: CfCalendar[] = ['standard', 'proleptic_gregorian', 'julian', 'noleap', 'all_leap', '360_day'];
    for (const calendar of calendars) {
      const start = dayNumber(1500, 1, 1, calendar);
      let previous = dateFromDayNumber(start, calendar);
      expect(previous).toEqual({ year: 1500, month: 1, day: 1 });
      let mismatches = 0;
      // Every day of 1500–2050: each date comes back to its number, and dates only move forward.
      for (let n = start + 1; n < start + 201_000; n += 1) {
        const d = dateFromDayNumber(n, calendar);
        if (dayNumber(d.year, d.month, d.day, calendar) !== n) mismatches++;
        if (d.year * 10000 + d.month * 100 + d.day <= previous.year * 10000 + previous.month * 100 + previous.day) mismatches++;
        previous = d;
      }
      expect(mismatches).toBe(0);
      expect(previous.year).toBeGreaterThan(2000);
    }
  });

  it('rejects the ten days dropped in October 1582 from the standard calendar', () => {
    expect(() => dayNumber(1582, 10, 5, 'standard')).toThrow(/1582-10-05 does not exist/);
    expect(() => dayNumber(1582, 10, 14, 'standard')).toThrow(/does not exist/);
  });
});

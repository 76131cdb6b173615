import { describe, expect, it } from 'vitest';
import { fixtureText } from '../../test-fixtures/read-fixture';
import { normalizeCalendar } from './normalize-calendar';
import { calendarDaysInMonth } from './calendar-days-in-month';

describe('calendarDaysInMonth() (CF 1.11 §4.4.1 leap rules)', () => {
  it('February follows each calendar rule', () => {
    expect(calendarDaysInMonth(1900, 2, 'proleptic_gregorian')).toBe(28); // divisible by 100, not 400
    expect(calendarDaysInMonth(2000, 2, 'proleptic_gregorian')).toBe(29); // divisible by 400
    expect(calendarDaysInMonth(1900, 2, 'julian')).toBe(29);
    expect(calendarDaysInMonth(1500, 2, 'standard')).toBe(29); // Julian part
    expect(calendarDaysInMonth(1700, 2, 'standard')).toBe(28); // Gregorian part
    expect(calendarDaysInMonth(2000, 2, 'noleap')).toBe(28);
    expect(calendarDaysInMonth(2001, 2, 'all_leap')).toBe(29);
    expect(calendarDaysInMonth(2001, 2, '360_day')).toBe(30);
  });

  it('other months are the usual lengths, 30 in 360_day', () => {
    expect([1, 4, 12].map((m) => calendarDaysInMonth(2001, m, 'standard'))).toEqual([31, 30, 31]);
    expect(calendarDaysInMonth(2001, 1, '360_day')).toBe(30);
  });
});

describe('calendarDaysInMonth() against cftime', () => {
  // Reference: common/test-fixtures/scripts/cf-month-lengths.py — cftime 1.6.2, length = next month's first day − this month's.
  const ref = JSON.parse(fixtureText('cf-month-lengths.json')).lengths as Record<string, Record<string, number[]>>;
  for (const [name, years] of Object.entries(ref)) {
    it(`gives cftime's month lengths for calendar "${name}" in ${Object.keys(years).join(', ')}`, () => {
      const calendar = normalizeCalendar(name);
      for (const [year, lengths] of Object.entries(years)) {
        expect(lengths.map((_, m) => calendarDaysInMonth(Number(year), m + 1, calendar))).toEqual(lengths);
      }
    });
  }
});

import { describe, expect, it } from 'vitest';
import { decodeCfTime } from './decode-cf-time';
import { encodeCfTime } from './encode-cf-time';

describe('encodeCfTime() (CF 1.11 §4.4)', () => {
  // Worked conversions from common/test-fixtures/check-values.json, computed with cftime 1.6.2 date2num (test-fixtures/scripts/check_values.py).
  it.each([
    ['standard', 18262],
    ['noleap', 18250],
    ['360_day', 18000],
  ])('2000-01-01 in days since 1950-01-01, %s = %d (check-values.json, cftime 1.6.2)', (calendar, expected) => {
    expect(encodeCfTime({ year: 2000, month: 1, day: 1 }, 'days since 1950-01-01', calendar)).toBe(expected);
  });

  // cftime 1.6.2 date2num, computed when this test was written: the standard calendar counts
  // Julian days before 1582-10-15 and drops ten days at the switch.
  it.each([
    ['standard', 'days since 1500-01-01', 182612],
    ['julian', 'days since 1500-01-01', 182625],
    ['proleptic_gregorian', 'days since 1500-01-01', 182621],
    ['standard', 'days since 1582-10-15', 152384],
  ])('2000-01-01 in %s, %s = %d (cftime 1.6.2)', (calendar, units, expected) => {
    expect(encodeCfTime({ year: 2000, month: 1, day: 1 }, units, calendar)).toBe(expected);
  });

  it('round-trips with decodeCfTime() in every calendar', () => {
    for (const calendar of ['standard', 'proleptic_gregorian', 'julian', 'noleap', 'all_leap', '360_day']) {
      const date = { year: 1987, month: 6, day: 30, hour: 12, minute: 0, second: 0 };
      const value = encodeCfTime(date, 'hours since 1850-01-01 06:00', calendar);
      expect(decodeCfTime([value], 'hours since 1850-01-01 06:00', calendar)[0]).toEqual(date);
    }
  });

  it('refuses dates that do not exist in the calendar', () => {
    expect(() => encodeCfTime({ year: 2001, month: 2, day: 29 }, 'days since 2000-01-01', 'standard')).toThrow(/2001-02-29 is not a date in the standard calendar/);
    expect(() => encodeCfTime({ year: 1582, month: 10, day: 10 }, 'days since 1500-01-01', 'standard')).toThrow(/does not exist in the standard calendar/);
    expect(encodeCfTime({ year: 1582, month: 10, day: 10 }, 'days since 1582-10-01', 'julian')).toBe(9);
  });
});

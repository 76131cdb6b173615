import { describe, expect, it } from 'vitest';
import { parseTimeUnits } from './parse-time-units';

describe('parseTimeUnits() (CF 1.11 §4.4)', () => {
  it('reads unit, reference and calendar; an omitted time of day is 00:00:00 UTC (CF 1.11 §4.4)', () => {
    expect(parseTimeUnits('days since 1950-01-01', 'noleap')).toEqual({
      unit: 'days',
      secondsPerUnit: 86400,
      calendar: 'noleap',
      reference: { year: 1950, month: 1, day: 1, hour: 0, minute: 0, second: 0 },
    });
  });

  it.each([
    'hours since 1800-1-1 00:00:0.0',
    'hours since 1800-01-01T00:00:00Z',
    'HOURS SINCE 1800-01-01 00:00:00 UTC',
    'hours since 1800-01-01 00:00',
    'hours since 1800-01-01 0:0:0 +00:00',
  ])('accepts the UDUNITS spelling "%s"', (units) => {
    expect(parseTimeUnits(units).reference).toEqual({ year: 1800, month: 1, day: 1, hour: 0, minute: 0, second: 0 });
  });

  it('converts a time-zone offset to UTC, across midnight (CF 1.11 §4.4 example: "-6:00" is west of UTC)', () => {
    expect(parseTimeUnits('seconds since 1992-10-8 21:15:42.5 -6:00').reference).toEqual({ year: 1992, month: 10, day: 9, hour: 3, minute: 15, second: 42.5 });
  });

  it('refuses units without " since " and says what was expected', () => {
    expect(() => parseTimeUnits('days')).toThrow(/"days" are not of the form "<unit> since <reference datetime>"/);
    expect(() => parseTimeUnits(undefined)).toThrow(/no units attribute/);
  });

  it('refuses an unknown unit and a malformed or impossible reference', () => {
    expect(() => parseTimeUnits('fortnights since 2000-01-01')).toThrow(/"fortnights"/);
    expect(() => parseTimeUnits('days since 01/01/2000')).toThrow(/reference datetime "01\/01\/2000"/);
    expect(() => parseTimeUnits('days since 2000-02-30', 'standard')).toThrow(/2000-02-30 is not a date/);
    expect(parseTimeUnits('days since 2000-02-30', '360_day').reference.day).toBe(30);
    expect(() => parseTimeUnits('days since 0000-01-01', 'standard')).toThrow(/no year 0/);
  });

  it('accepts years since in 360_day as 360 days and refuses it elsewhere', () => {
    expect(parseTimeUnits('years since 0001-01-01', '360_day').secondsPerUnit).toBe(360 * 86400);
    expect(() => parseTimeUnits('years since 2000-01-01', 'noleap')).toThrow(/360_day/);
  });
});

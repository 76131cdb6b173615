import { describe, expect, it } from 'vitest';
import { CfTimeError } from './cf-time-error';
import { decodeCfTime } from './decode-cf-time';

const ymd = (d: { year: number; month: number; day: number }) =>
  `${String(d.year).padStart(4, '0')}-${String(d.month).padStart(2, '0')}-${String(d.day).padStart(2, '0')}`;

describe('decodeCfTime() (CF 1.11 §4.4 "Time coordinate")', () => {
  // Worked conversions from common/test-fixtures/check-values.json, computed with cftime 1.6.2 num2date (test-fixtures/scripts/check_values.py).
  it.each([
    ['standard', 59, '2000-02-29'],
    ['noleap', 59, '2000-03-01'],
    ['360_day', 59, '2000-02-30'],
    ['standard', 365, '2000-12-31'],
    ['noleap', 365, '2001-01-01'],
    ['360_day', 365, '2001-01-06'],
  ])('days since 2000-01-01 in %s: %d → %s (check-values.json, cftime 1.6.2)', (calendar, value, expected) => {
    expect(ymd(decodeCfTime([value], 'days since 2000-01-01', calendar)[0])).toBe(expected);
  });

  it('treats the deprecated alias "gregorian" as "standard" (CF 1.11 §4.4.1)', () => {
    expect(ymd(decodeCfTime([59], 'days since 2000-01-01', 'gregorian')[0])).toBe('2000-02-29');
  });

  it('defaults to the standard calendar when the attribute is missing (CF 1.11 §4.4.1)', () => {
    expect(ymd(decodeCfTime([59], 'days since 2000-01-01')[0])).toBe('2000-02-29');
  });

  it('decodes all_leap / 366_day with a 29 February every year (cftime 1.6.2: 59 → 2000-02-29, 365 → 2000-12-31)', () => {
    expect(decodeCfTime([59, 365], 'days since 2000-01-01', 'all_leap').map(ymd)).toEqual(['2000-02-29', '2000-12-31']);
    // 2001-01-01 + 366 days = 2002-01-01; + 31 (January) + 28 = 2002-02-29.
    expect(decodeCfTime([425], 'days since 2001-01-01', '366_day').map(ymd)).toEqual(['2002-02-29']);
  });

  // The Julian→Gregorian switch (CF 1.11 §4.4.1): in `standard`, 1582-10-04 is followed by 1582-10-15.
  // Expected dates computed with cftime 1.6.2 (Debian python3-cftime) when this test was written.
  it.each([
    ['standard', ['1582-10-04', '1582-10-15', '1582-10-21']],
    ['julian', ['1582-10-04', '1582-10-05', '1582-10-11']],
    ['proleptic_gregorian', ['1582-10-04', '1582-10-05', '1582-10-11']],
  ])('days since 1582-10-01 in %s: 3, 4, 10 → %j (cftime 1.6.2)', (calendar, expected) => {
    expect(decodeCfTime([3, 4, 10], 'days since 1582-10-01', calendar).map(ymd)).toEqual(expected);
  });

  it('1900 is a leap year in julian but not in standard (Julian rule: every 4th year; cftime 1.6.2)', () => {
    expect(ymd(decodeCfTime([1], 'days since 1900-02-28', 'julian')[0])).toBe('1900-02-29');
    expect(ymd(decodeCfTime([1], 'days since 1900-02-28', 'standard')[0])).toBe('1900-03-01');
  });

  it('decodes seconds, minutes and hours and their CF abbreviations (CF 1.11 §4.4: sec, s, min, hr, h)', () => {
    // 1e9 s after 1970-01-01 is 2001-09-09 01:46:40 UTC (the well-known "billennium"; cftime 1.6.2 agrees).
    const [t] = decodeCfTime([1e9], 'seconds since 1970-01-01 00:00:00', 'standard');
    expect(t).toEqual({ year: 2001, month: 9, day: 9, hour: 1, minute: 46, second: 40 });
    expect(decodeCfTime([90], 'min since 2000-01-01', 'standard')[0]).toMatchObject({ hour: 1, minute: 30 });
    expect(decodeCfTime([36], 'hr since 2000-01-01', 'noleap')[0]).toMatchObject({ day: 2, hour: 12 });
    expect(decodeCfTime([7200], 's since 2000-01-01', 'standard')[0]).toMatchObject({ hour: 2 });
    expect(decodeCfTime([1], 'day since 2000-01-01', 'standard')[0]).toMatchObject({ day: 2 });
  });

  it('keeps fractional days and rounds to the millisecond (1/24 day = 01:00:00, not 00:59:59.999)', () => {
    expect(decodeCfTime([1 / 24], 'days since 2000-01-01', 'standard')[0]).toMatchObject({ hour: 1, minute: 0, second: 0 });
    expect(decodeCfTime([15.5], 'days since 2000-01-01', 'standard')[0]).toMatchObject({ day: 16, hour: 12 });
  });

  it('decodes negative values before the reference (cftime 1.6.2: -1 day since 2000-01-01 → 1999-12-31)', () => {
    expect(ymd(decodeCfTime([-1], 'days since 2000-01-01', 'standard')[0])).toBe('1999-12-31');
  });

  it('applies a reference time-zone offset as CF 1.11 §4.4 describes ("-6:00" is six hours west of UTC)', () => {
    // Local 00:00 at UTC−6 is 06:00 UTC, so 1.5 h later is 07:30 UTC. (cftime 1.6.2 ignores the offset and says 01:30.)
    expect(decodeCfTime([1.5], 'hours since 2000-01-01 00:00:00 -6:00', 'standard')[0]).toMatchObject({ day: 1, hour: 7, minute: 30 });
  });

  it('accepts months since only in 360_day, as 30-day months (cftime 1.6.2: 13 months since 2000-01-01 → 2001-02-01)', () => {
    expect(ymd(decodeCfTime([13], 'months since 2000-01-01', '360_day')[0])).toBe('2001-02-01');
    expect(() => decodeCfTime([13], 'months since 2000-01-01', 'standard')).toThrow(/tropical year.*360_day/);
  });

  it('refuses a missing time value and names its index', () => {
    expect(() => decodeCfTime([0, Number.NaN], 'days since 2000-01-01')).toThrow(/index 1/);
  });

  it('returns nothing for no values', () => {
    expect(decodeCfTime([], 'days since 2000-01-01')).toEqual([]);
  });

  it('refuses calendar "none" and unknown calendars, naming them', () => {
    expect(() => decodeCfTime([0], 'days since 2000-01-01', 'none')).toThrow(/"none"/);
    expect(() => decodeCfTime([0], 'days since 2000-01-01', 'mayan')).toThrow(CfTimeError);
    expect(() => decodeCfTime([0], 'days since 2000-01-01', 'mayan')).toThrow(/unknown calendar "mayan"/);
  });
});

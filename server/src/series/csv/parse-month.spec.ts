import { describe, expect, it } from 'vitest';
import { monthIndex, monthKey } from './month-index';
import { decimalYearToMonth, readMonth, readMonthOfYear, readYear } from './parse-month';

const key = (index: number | null) => (index === null ? null : monthKey(index));

describe('decimalYearToMonth(): month = floor(frac·12 + 0.01)', () => {
  it.each([
    [1997.0, '1997-01'],
    [1997.042, '1997-01'], // the month containing the fraction
    [1997.0417, '1997-01'], // mid-month convention (year + 0.5/12)
    [1997.083, '1997-02'], // start of February written with 3 decimals (1/12 = 0.0833…)
    [1997.0833, '1997-02'],
    [1997.5, '1997-07'],
    [1997.9583, '1997-12'], // mid-December
    [1997.9167, '1997-12'], // start of December, rounded
    [1997.999, '1997-12'],
    [1997.9995, '1998-01'], // within 0.01 month of the new year: carried into January
  ])('%d is %s', (value, expected) => {
    expect(monthKey(decimalYearToMonth(value))).toBe(expected);
  });

  it('maps each of the 12 mid-month stamps of a year to a different month, in order', () => {
    const months = Array.from({ length: 12 }, (_, m) => decimalYearToMonth(2001 + (m + 0.5) / 12));
    expect(months).toEqual(Array.from({ length: 12 }, (_, m) => monthIndex(2001, m + 1)));
  });
});

describe('readMonth()', () => {
  it.each([
    ['1997-03', '1997-03'],
    ['1997-3', '1997-03'],
    ['1997-03-31', '1997-03'],
    ['1997-02-30', '1997-02'], // 360_day model calendars have a February 30
    ['1997-03-16 12:00:00', '1997-03'],
    ['1997-03-16T12:00:00Z', '1997-03'],
    ['0001-01-16', '0001-01'], // model control runs start in year 1
  ])('iso: %s is %s', (cell, expected) => expect(key(readMonth(cell, 'iso'))).toBe(expected));

  it.each(['1997-13', '1997-00', '1997-03-32', '97-03', '1997-03-15x', '1997/03', ''])('iso: %s is not a date', (cell) => {
    expect(readMonth(cell, 'iso')).toBeNull();
  });

  it('reads YYYY/MM and YYYY/MM/DD in the slash format', () => {
    expect(key(readMonth('1997/03', 'slash'))).toBe('1997-03');
    expect(key(readMonth('1997/03/15', 'slash'))).toBe('1997-03');
    expect(readMonth('1997-03', 'slash')).toBeNull();
  });

  it('reads decimal years with a point or a comma, and refuses text', () => {
    expect(key(readMonth('1997.5', 'decimal-year'))).toBe('1997-07');
    expect(key(readMonth('1997,5', 'decimal-year'))).toBe('1997-07');
    expect(readMonth('abc', 'decimal-year')).toBeNull();
    expect(readMonth('0.5', 'decimal-year')).toBeNull();
  });
});

describe('readYear() and readMonthOfYear()', () => {
  it('reads whole years, also written 1997.0, and refuses the rest', () => {
    expect(readYear('1997')).toBe(1997);
    expect(readYear('1997.0')).toBe(1997);
    expect(readYear('1997.5')).toBeNull();
    expect(readYear('19x7')).toBeNull();
    expect(readYear('0')).toBeNull();
  });

  it('reads month numbers and English names in any case', () => {
    expect(['1', '01', '12', 'Jan', 'JAN', 'sep', 'Sept', 'December', 'dec.'].map(readMonthOfYear)).toEqual([1, 1, 12, 1, 1, 9, 9, 12, 12]);
    expect(['0', '13', 'Foo', ''].map(readMonthOfYear)).toEqual([null, null, null, null]);
  });
});

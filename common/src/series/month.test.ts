import { describe, expect, it } from 'vitest';
import { AnalysisInputError } from './analysis-input-error';
import { daysInMonth, formatMonth, isLeapYear, parseMonth } from './month';

describe('month helpers', () => {
  it('parseMonth() and formatMonth() round-trip and put January at index % 12 = 0', () => {
    expect(parseMonth('1997-01') % 12).toBe(0);
    expect(parseMonth('1998-03') - parseMonth('1997-12')).toBe(3);
    expect(formatMonth(parseMonth('0001-12'))).toBe('0001-12');
  });

  it('parseMonth() rejects anything but YYYY-MM with an AnalysisInputError', () => {
    for (const bad of ['1997-13', '1997-1', '97-01', '1997-00', '']) expect(() => parseMonth(bad)).toThrow(AnalysisInputError);
  });

  it('daysInMonth() follows the Gregorian leap-year rule (2000 leap, 1900 not, 2024 leap)', () => {
    expect(daysInMonth(parseMonth('2000-02'))).toBe(29);
    expect(daysInMonth(parseMonth('1900-02'))).toBe(28);
    expect(daysInMonth(parseMonth('2024-02'))).toBe(29);
    expect(daysInMonth(parseMonth('2023-01'))).toBe(31);
    expect(daysInMonth(parseMonth('2023-04'))).toBe(30);
    expect(isLeapYear(2100)).toBe(false);
  });
});

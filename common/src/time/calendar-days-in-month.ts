import type { CfCalendar } from './types';

const COMMON = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

/**
 * Number of days in a month of a CF calendar (CF 1.11 §4.4.1).
 * Leap rules: Gregorian — divisible by 4 and not by 100, or by 400; Julian — divisible by 4;
 * `standard` follows Julian before 1582 and Gregorian after (1582 itself is not a leap year in either).
 * October 1582 in `standard` still returns 31: the ten dropped days are rejected by `dayNumber()`.
 */
export function calendarDaysInMonth(year: number, month: number, calendar: CfCalendar): number {
  if (calendar === '360_day') return 30;
  if (month !== 2) return COMMON[month - 1];
  switch (calendar) {
    case 'noleap':
      return 28;
    case 'all_leap':
      return 29;
    case 'julian':
      return isJulianLeap(year) ? 29 : 28;
    case 'proleptic_gregorian':
      return isGregorianLeap(year) ? 29 : 28;
    case 'standard':
      return (year < 1582 ? isJulianLeap(year) : isGregorianLeap(year)) ? 29 : 28;
  }
}

function isJulianLeap(year: number): boolean {
  return mod(year, 4) === 0;
}

function isGregorianLeap(year: number): boolean {
  return (mod(year, 4) === 0 && mod(year, 100) !== 0) || mod(year, 400) === 0;
}

function mod(a: number, b: number): number {
  return ((a % b) + b) % b;
}

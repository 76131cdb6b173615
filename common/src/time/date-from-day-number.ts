import type { CfCalendar } from './types';

const BEFORE_365 = [0, 31, 59, 90, 120, 151, 181, 212, 243, 273, 304, 334, 365];
const BEFORE_366 = [0, 31, 60, 91, 121, 152, 182, 213, 244, 274, 305, 335, 366];

// First Julian Day Number of the Gregorian part of the `standard` calendar: 1582-10-15.
const GREGORIAN_START_JDN = 2299161;

/** Inverse of `dayNumber()`: the calendar date of a day number. */
export function dateFromDayNumber(n: number, calendar: CfCalendar): { year: number; month: number; day: number } {
  switch (calendar) {
    case 'noleap':
      return fromFixedYear(n, 365, BEFORE_365);
    case 'all_leap':
      return fromFixedYear(n, 366, BEFORE_366);
    case '360_day': {
      const year = Math.floor(n / 360);
      const rest = n - year * 360;
      return { year, month: Math.floor(rest / 30) + 1, day: (rest % 30) + 1 };
    }
    case 'julian':
      return fromJdn(n, false);
    case 'proleptic_gregorian':
      return fromJdn(n, true);
    case 'standard':
      return fromJdn(n, n >= GREGORIAN_START_JDN);
  }
}

function fromFixedYear(n: number, length: number, before: number[]): { year: number; month: number; day: number } {
  const year = Math.floor(n / length);
  const dayOfYear = n - year * length;
  let month = 1;
  while (before[month] <= dayOfYear) month++;
  return { year, month, day: dayOfYear - before[month - 1] + 1 };
}

// Richards' algorithm (E. G. Richards, "Algorithm F", in Explanatory Supplement to the Astronomical
// Almanac, 3rd ed., 2013, §15.11.3), valid for non-negative Julian Day Numbers (dates after 4713 BC).
function fromJdn(jdn: number, gregorian: boolean): { year: number; month: number; day: number } {
  let f = jdn + 1401;
  if (gregorian) f += Math.floor((Math.floor((4 * jdn + 274277) / 146097) * 3) / 4) - 38;
  const e = 4 * f + 3;
  const g = Math.floor((e % 1461) / 4);
  const h = 5 * g + 2;
  const day = Math.floor((h % 153) / 5) + 1;
  const month = ((Math.floor(h / 153) + 2) % 12) + 1;
  const year = Math.floor(e / 1461) - 4716 + Math.floor((12 + 2 - month) / 12);
  return { year, month, day };
}

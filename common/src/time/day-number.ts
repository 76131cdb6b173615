import { CfTimeError } from './cf-time-error';
import { calendarDaysInMonth } from './calendar-days-in-month';
import type { CfCalendar } from './types';

// Days before each month in a 365-day and a 366-day year.
const BEFORE_365 = [0, 31, 59, 90, 120, 151, 181, 212, 243, 273, 304, 334];
const BEFORE_366 = [0, 31, 60, 91, 121, 152, 182, 213, 244, 274, 305, 335];

/**
 * Counts days of a calendar on one integer line, so that the difference of two day numbers
 * is the number of days between two dates in that calendar.
 * Real-world calendars use the Julian Day Number (JDN of the day starting at midnight);
 * the idealised ones count from 0000-01-01. Only differences are meaningful across calendars.
 * Throws on dates that do not exist in the calendar (e.g. 2001-02-29, 1582-10-10 in `standard`).
 */
export function dayNumber(year: number, month: number, day: number, calendar: CfCalendar): number {
  if (!Number.isInteger(year) || !Number.isInteger(month) || !Number.isInteger(day) || month < 1 || month > 12 || day < 1 || day > calendarDaysInMonth(year, month, calendar)) {
    throw new CfTimeError('bad-reference', `${formatDate(year, month, day)} is not a date in the ${calendar} calendar`);
  }
  switch (calendar) {
    case 'noleap':
      return year * 365 + BEFORE_365[month - 1] + day - 1;
    case 'all_leap':
      return year * 366 + BEFORE_366[month - 1] + day - 1;
    case '360_day':
      return year * 360 + (month - 1) * 30 + day - 1;
    case 'julian':
      return julianJdn(year, month, day);
    case 'proleptic_gregorian':
      return gregorianJdn(year, month, day);
    case 'standard': {
      // CF 1.11 §4.4.1: mixed calendar, Julian up to 1582-10-04, Gregorian from 1582-10-15.
      const ymd = year * 10000 + month * 100 + day;
      if (ymd >= 15821015) return gregorianJdn(year, month, day);
      if (ymd <= 15821004) return julianJdn(year, month, day);
      throw new CfTimeError('bad-reference', `${formatDate(year, month, day)} does not exist in the standard calendar: 1582-10-04 (Julian) is followed by 1582-10-15 (Gregorian)`);
    }
  }
}

// Fliegel & Van Flandern (1968), "A machine algorithm for processing calendar dates",
// Comm. ACM 11(10):657, written with floor division so it also holds for years before 1.
function gregorianJdn(y: number, m: number, d: number): number {
  const a = Math.floor((14 - m) / 12);
  const yy = y + 4800 - a;
  const mm = m + 12 * a - 3;
  return d + Math.floor((153 * mm + 2) / 5) + 365 * yy + Math.floor(yy / 4) - Math.floor(yy / 100) + Math.floor(yy / 400) - 32045;
}

function julianJdn(y: number, m: number, d: number): number {
  const a = Math.floor((14 - m) / 12);
  const yy = y + 4800 - a;
  const mm = m + 12 * a - 3;
  return d + Math.floor((153 * mm + 2) / 5) + 365 * yy + Math.floor(yy / 4) - 32083;
}

function formatDate(y: number, m: number, d: number): string {
  return `${String(y).padStart(4, '0')}-${String(m).padStart(2, '0')}-${String(d).padStart(2, '0')}`;
}

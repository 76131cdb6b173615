import { calendarDaysInMonth } from '../time/calendar-days-in-month';
import type { CfCalendar } from '../time/types';
import { AnalysisInputError } from './analysis-input-error';

const MONTH_RE = /^(\d{4})-(0[1-9]|1[0-2])$/;

/** Short English month names, January first, for messages. */
export const MONTH_NAMES = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** "YYYY-MM" → months since 0000-01 (so index % 12 is the calendar month, 0 = January). */
export function parseMonth(text: string): number {
  const m = MONTH_RE.exec(text);
  if (!m) throw new AnalysisInputError(`"${text}" is not a month of the form YYYY-MM`);
  return Number(m[1]) * 12 + Number(m[2]) - 1;
}

/** Months since 0000-01 → "YYYY-MM". */
export function formatMonth(index: number): string {
  const year = Math.floor(index / 12);
  const month = index - year * 12 + 1;
  return `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}`;
}

/** Days in the month at `index` (months since 0000-01), proleptic Gregorian calendar. */
export function daysInMonth(index: number): number {
  const year = Math.floor(index / 12);
  const month = index - year * 12;
  if (month === 1) return isLeapYear(year) ? 29 : 28;
  return [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31][month];
}

/** Gregorian leap-year rule: every 4th year, except centuries not divisible by 400. */
export function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

/**
 * Days in the month at `index` (months since 0000-01) in a CF calendar (CF 1.11 §4.4.1): noleap
 * 365-day years, 360_day 30-day months, standard Julian before 1582 … (calendarDaysInMonth).
 */
export function monthDays(index: number, calendar: CfCalendar): number {
  const year = Math.floor(index / 12);
  return calendarDaysInMonth(year, index - year * 12 + 1, calendar);
}

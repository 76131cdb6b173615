import type { CsvDateFormat } from '@upwell/common';
import { monthIndex } from './month-index';

const ISO = /^(\d{4})-(\d{1,2})(?:-(\d{1,2})(?:[T ]\d{1,2}:\d{2}(?::\d{2}(?:\.\d+)?)?(?:Z|[+-]\d{2}:?\d{2})?)?)?$/;
const SLASH = /^(\d{4})\/(\d{1,2})(?:\/(\d{1,2}))?$/;
const INTEGER = /^\d{1,4}$/;
const DECIMAL_YEAR = /^\d{1,4}([.,]\d+)?$/;
const MONTH_NAMES = ['jan', 'feb', 'mar', 'apr', 'may', 'jun', 'jul', 'aug', 'sep', 'oct', 'nov', 'dec'];
const LONG_MONTH_NAMES = [
  'january', 'february', 'march', 'april', 'may', 'june',
  'july', 'august', 'september', 'october', 'november', 'december',
];

/**
 * Tolerance of the decimal-year rule, in months. Start-of-month stamps rounded to a few decimals fall just
 * short of the boundary (Feb = 1/12 = 0.08333…, written 1997.083 or 1997.0833); 0.01 month (≈ 7 h) lifts them
 * into their month without moving mid-month stamps (1997.0417) anywhere near a boundary.
 */
export const DECIMAL_YEAR_EPSILON = 0.01;

/**
 * Month of a decimal year: the month containing the fraction, month = floor(frac·12 + ε) with ε = 0.01 month.
 * So 1997.0 and 1997.042 (and the mid-month 1997.0417) are January 1997, 1997.083 is February, 1997.9583 December.
 * A stamp within ε of the end of December counts as January of the next year.
 */
export function decimalYearToMonth(value: number): number {
  const year = Math.floor(value);
  const month = Math.floor((value - year) * 12 + DECIMAL_YEAR_EPSILON);
  return year * 12 + month;
}

/**
 * Reads a date cell in the given format to a month index, or null when it cannot be read.
 * Days 1–31 are accepted in any month, because model calendars (CF `360_day`) have a February 30.
 */
export function readMonth(cell: string, format: Exclude<CsvDateFormat, 'year+month'>): number | null {
  if (format === 'decimal-year') {
    if (!DECIMAL_YEAR.test(cell)) return null;
    const value = Number(cell.replace(',', '.'));
    return value >= 1 && value < 10_000 ? decimalYearToMonth(value) : null;
  }
  const m = (format === 'iso' ? ISO : SLASH).exec(cell);
  if (!m) return null;
  const month = Number(m[2]);
  const day = m[3] === undefined ? 1 : Number(m[3]);
  if (month < 1 || month > 12 || day < 1 || day > 31) return null;
  return monthIndex(Number(m[1]), month);
}

/** A whole year, 1–9999 (model control runs start at year 1), or null. */
export function readYear(cell: string): number | null {
  if (!INTEGER.test(cell)) {
    // Spreadsheets write whole years as 1997.0.
    if (!/^\d{1,4}\.0+$/.test(cell)) return null;
  }
  const year = Math.trunc(Number(cell));
  return year >= 1 && year <= 9999 ? year : null;
}

/** A month number 1–12 or an English month name or abbreviation (any case), or null. */
export function readMonthOfYear(cell: string): number | null {
  if (/^\d{1,2}$/.test(cell)) {
    const n = Number(cell);
    return n >= 1 && n <= 12 ? n : null;
  }
  const lower = cell.toLowerCase().replace(/\.$/, '');
  const short = MONTH_NAMES.indexOf(lower);
  if (short >= 0) return short + 1;
  const long = LONG_MONTH_NAMES.indexOf(lower);
  if (long >= 0) return long + 1;
  return lower === 'sept' ? 9 : null;
}

/** The format a date cell is written in, judged from one cell, or null when it is none of them. */
export function guessDateFormat(cell: string): Exclude<CsvDateFormat, 'year+month'> | null {
  if (readMonth(cell, 'iso') !== null) return 'iso';
  if (readMonth(cell, 'slash') !== null) return 'slash';
  return null;
}

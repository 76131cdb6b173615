import type { DateTimeParts } from './types';

/** The "YYYY-MM" key of the month a date falls in (years padded to four digits, as ISO 8601). */
export function monthKey(date: Pick<DateTimeParts, 'year' | 'month'>): string {
  const sign = date.year < 0 ? '-' : '';
  return `${sign}${String(Math.abs(date.year)).padStart(4, '0')}-${String(date.month).padStart(2, '0')}`;
}

import { dayNumber } from './day-number';
import { parseTimeUnits } from './parse-time-units';
import type { DateTimeParts } from './types';

/**
 * Encodes a calendar date-time as a CF time value in `units` and `calendar` (CF 1.11 §4.4);
 * the inverse of `decodeCfTime()`. Omitted hour/minute/second mean 00:00:00.
 * Used to write files (fixtures, benches) and to check decoding round trips.
 */
export function encodeCfTime(
  date: Pick<DateTimeParts, 'year' | 'month' | 'day'> & Partial<DateTimeParts>,
  units: string,
  calendar?: string | null,
): number {
  const parsed = parseTimeUnits(units, calendar);
  const ref = parsed.reference;
  const days = dayNumber(date.year, date.month, date.day, parsed.calendar) - dayNumber(ref.year, ref.month, ref.day, parsed.calendar);
  const seconds =
    days * 86400 +
    ((date.hour ?? 0) - ref.hour) * 3600 +
    ((date.minute ?? 0) - ref.minute) * 60 +
    ((date.second ?? 0) - ref.second);
  return seconds / parsed.secondsPerUnit;
}

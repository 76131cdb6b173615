import type { DateTimeParts } from './types';

/**
 * Whether every time stamp is 00:00 on the first day of a month. Without time bounds such an axis is
 * ambiguous: a monthly mean stamped at the end of its interval (a January mean at 1 February 00:00,
 * common in model output [common practice]) would be placed one month late, while CF 1.11 §7.1
 * expects bounds to say which interval a value covers. False for an empty axis.
 */
export function stampedAtMonthStarts(times: ReadonlyArray<DateTimeParts>): boolean {
  if (times.length === 0) return false;
  return times.every((t) => t.day === 1 && t.hour === 0 && t.minute === 0 && t.second === 0);
}

import { CfTimeError } from './cf-time-error';
import { dateFromDayNumber } from './date-from-day-number';
import { dayNumber } from './day-number';
import { parseTimeUnits } from './parse-time-units';
import type { DateTimeParts } from './types';

/**
 * Decodes CF time values (CF 1.11 §4.4) into calendar date-time parts.
 * `units` is the variable's `units` attribute and `calendar` its `calendar` attribute
 * (missing = `standard`). Missing time values (NaN) are refused with the index: a time axis
 * with holes cannot be placed on a calendar. Seconds are rounded to the millisecond so that
 * values such as 1/24 day do not come out as 00:59:59.999999.
 */
export function decodeCfTime(values: ArrayLike<number>, units: string, calendar?: string | null): DateTimeParts[] {
  const parsed = parseTimeUnits(units, calendar);
  const ref = parsed.reference;
  const refDay = dayNumber(ref.year, ref.month, ref.day, parsed.calendar);
  const refSecond = ref.hour * 3600 + ref.minute * 60 + ref.second;
  const out: DateTimeParts[] = new Array(values.length);
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (!Number.isFinite(v)) {
      throw new CfTimeError('bad-value', `time value at index ${i} is missing or not finite (${v}); every time step needs a time`, i);
    }
    const totalMs = Math.round((refSecond + v * parsed.secondsPerUnit) * 1000);
    const days = Math.floor(totalMs / 86_400_000);
    const ms = totalMs - days * 86_400_000;
    const date = dateFromDayNumber(refDay + days, parsed.calendar);
    out[i] = {
      ...date,
      hour: Math.floor(ms / 3_600_000),
      minute: Math.floor((ms % 3_600_000) / 60_000),
      second: (ms % 60_000) / 1000,
    };
  }
  return out;
}

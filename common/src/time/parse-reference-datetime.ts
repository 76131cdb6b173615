import { CfTimeError } from './cf-time-error';
import { dateFromDayNumber } from './date-from-day-number';
import { dayNumber } from './day-number';
import type { CfCalendar, DateTimeParts } from './types';

// UDUNITS-style reference: "1950-01-01", "1950-1-1 0:0:0", "1950-01-01T12:00:00Z",
// "1800-01-01 00:00:0.0", "1990-01-01 00:00:00 -6:00", "2000-01-01 00:00:00 UTC".
const PATTERN =
  /^([+-]?\d{1,5})-(\d{1,2})-(\d{1,2})(?:(?:T|\s+)(\d{1,2})(?::(\d{1,2})(?::(\d{1,2}(?:\.\d*)?))?)?)?\s*(Z|UTC|GMT|[+-]?\d{1,2}(?::?\d{2})?)?$/i;

/**
 * Parses the reference datetime of a CF time `units` attribute (CF 1.11 §4.4; the grammar is UDUNITS').
 * An omitted time of day means 00:00:00 UTC (CF 1.11 §4.4). A time-zone offset is applied,
 * so the result is in UTC. Years before 1 are refused in `standard` and `julian`, where there is
 * no year 0 and CF has never fixed how to write earlier years.
 */
export function parseReferenceDatetime(text: string, calendar: CfCalendar): DateTimeParts {
  const match = PATTERN.exec(text.trim());
  if (!match) {
    throw new CfTimeError('bad-reference', `reference datetime "${text}" is not of the form YYYY-MM-DD[ hh:mm:ss][ zone]`);
  }
  const [, y, mo, d, h = '0', mi = '0', s = '0', zone] = match;
  const year = Number(y);
  const month = Number(mo);
  const day = Number(d);
  const hour = Number(h);
  const minute = Number(mi);
  const second = Number(s);
  if ((calendar === 'standard' || calendar === 'julian') && year < 1) {
    throw new CfTimeError('bad-reference', `reference year ${year} is before year 1; the ${calendar} calendar has no year 0 and CF does not define earlier years`);
  }
  if (hour > 23 || minute > 59 || second >= 61) {
    throw new CfTimeError('bad-reference', `reference time ${h}:${mi}:${s} in "${text}" is not a time of day`);
  }
  const days = dayNumber(year, month, day, calendar);
  const offsetSeconds = zoneOffsetSeconds(zone, text);
  if (offsetSeconds === 0) return { year, month, day, hour, minute, second };

  // Local time = UTC + offset, so UTC = local − offset; the shift may cross midnight.
  const total = hour * 3600 + minute * 60 + second - offsetSeconds;
  const dayShift = Math.floor(total / 86400);
  const secondOfDay = total - dayShift * 86400;
  const date = dateFromDayNumber(days + dayShift, calendar);
  return {
    ...date,
    hour: Math.floor(secondOfDay / 3600),
    minute: Math.floor((secondOfDay % 3600) / 60),
    second: secondOfDay % 60,
  };
}

function zoneOffsetSeconds(zone: string | undefined, text: string): number {
  if (!zone || /^(Z|UTC|GMT)$/i.test(zone)) return 0;
  const m = /^([+-]?)(\d{1,2}):?(\d{2})?$/.exec(zone);
  if (!m) throw new CfTimeError('bad-reference', `time zone "${zone}" in "${text}" is not understood`);
  const sign = m[1] === '-' ? -1 : 1;
  const hours = Number(m[2]);
  const minutes = Number(m[3] ?? '0');
  if (hours > 14 || minutes > 59) throw new CfTimeError('bad-reference', `time zone "${zone}" in "${text}" is out of range`);
  return sign * (hours * 3600 + minutes * 60);
}

import { CfTimeError } from './cf-time-error';
import { normalizeCalendar } from './normalize-calendar';
import { parseReferenceDatetime } from './parse-reference-datetime';
import type { CfTimeUnit, CfTimeUnits } from './types';

// CF 1.11 §4.4 lists day (d), hour (hr, h), minute (min) and second (sec, s); UDUNITS adds plurals.
const UNIT_ALIASES: Record<string, CfTimeUnit> = {
  second: 'seconds', seconds: 'seconds', sec: 'seconds', secs: 'seconds', s: 'seconds',
  minute: 'minutes', minutes: 'minutes', min: 'minutes', mins: 'minutes',
  hour: 'hours', hours: 'hours', hr: 'hours', hrs: 'hours', h: 'hours',
  day: 'days', days: 'days', d: 'days',
  month: 'months', months: 'months',
  year: 'years', years: 'years', yr: 'years', yrs: 'years',
};

const SECONDS: Record<Exclude<CfTimeUnit, 'months' | 'years'>, number> = {
  seconds: 1,
  minutes: 60,
  hours: 3600,
  days: 86400,
};

/**
 * Parses a CF time `units` attribute, `"<unit> since <reference datetime>"` (CF 1.11 §4.4),
 * for the calendar named by the variable's `calendar` attribute.
 *
 * Months and years: UDUNITS defines them as fractions of a tropical year (a year is
 * 365.242198781 days), which CF 1.11 §4.4 warns is not a calendar month or year; decoding
 * them in a real calendar would put monthly values on the wrong day, so they are refused.
 * In the `360_day` calendar a month is exactly 30 days and a year exactly 360 days, which is
 * how such files are meant, so they are accepted there (as cftime does).
 */
export function parseTimeUnits(units: string | undefined | null, calendarAttribute?: string | null): CfTimeUnits {
  if (units === undefined || units === null || units.trim() === '') {
    throw new CfTimeError('bad-units', 'time variable has no units attribute; CF 1.11 §4.4 requires "<unit> since <reference datetime>"');
  }
  const match = /^\s*([A-Za-z]+)\s+since\s+(.+?)\s*$/i.exec(units);
  if (!match) {
    throw new CfTimeError('bad-units', `time units "${units}" are not of the form "<unit> since <reference datetime>" (CF 1.11 §4.4)`);
  }
  const calendar = normalizeCalendar(calendarAttribute);
  const unit = UNIT_ALIASES[match[1].toLowerCase()];
  if (!unit) {
    throw new CfTimeError('unsupported-unit', `time unit "${match[1]}" in "${units}" is not one of seconds, minutes, hours, days (CF 1.11 §4.4)`);
  }
  let secondsPerUnit: number;
  if (unit === 'months' || unit === 'years') {
    if (calendar !== '360_day') {
      throw new CfTimeError(
        'unsupported-unit',
        `time units "${units}" use ${unit}, which UDUNITS defines from the tropical year (365.242198781 days), not calendar ${unit}; CF 1.11 §4.4 advises against them. They are accepted only with calendar = "360_day"; ask the provider for days since a date`,
      );
    }
    secondsPerUnit = unit === 'months' ? 30 * 86400 : 360 * 86400;
  } else {
    secondsPerUnit = SECONDS[unit];
  }
  return { unit, secondsPerUnit, reference: parseReferenceDatetime(match[2], calendar), calendar };
}

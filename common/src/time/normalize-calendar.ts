import { CfTimeError } from './cf-time-error';
import type { CfCalendar } from './types';

// CF 1.11 §4.4.1: names are case-insensitive; `gregorian` is a deprecated alias of `standard`,
// `365_day` of `noleap`, `366_day` of `all_leap`.
const ALIASES: Record<string, CfCalendar> = {
  standard: 'standard',
  gregorian: 'standard',
  proleptic_gregorian: 'proleptic_gregorian',
  julian: 'julian',
  noleap: 'noleap',
  '365_day': 'noleap',
  all_leap: 'all_leap',
  '366_day': 'all_leap',
  '360_day': '360_day',
};

/** The calendar names CF 1.11 §4.4.1 defines that can be decoded, canonical names and aliases. */
export const CF_CALENDAR_NAMES = Object.keys(ALIASES) as [string, ...string[]];

/**
 * Maps a `calendar` attribute to its canonical CF calendar name.
 * A missing attribute means `standard` (CF 1.11 §4.4.1: "the default").
 * `none` (CF 1.11 §4.4.1: no calendar, time is not a date) and unknown names throw,
 * because no date can be derived from them.
 */
export function normalizeCalendar(attribute: string | undefined | null): CfCalendar {
  if (attribute === undefined || attribute === null || attribute.trim() === '') return 'standard';
  const key = attribute.trim().toLowerCase();
  const calendar = ALIASES[key];
  if (calendar) return calendar;
  if (key === 'none') {
    throw new CfTimeError(
      'no-calendar',
      `calendar "${attribute}" means the time axis has no calendar (CF 1.11 §4.4.1), so it cannot be turned into months`,
    );
  }
  throw new CfTimeError(
    'unknown-calendar',
    `unknown calendar "${attribute}"; expected one of standard, gregorian, proleptic_gregorian, julian, noleap, 365_day, all_leap, 366_day, 360_day (CF 1.11 §4.4.1)`,
  );
}

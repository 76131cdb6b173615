/**
 * Shared shapes for CF time decoding (CF Conventions 1.11, §4.4 "Time coordinate").
 */

/** A calendar date and time of day, as the calendar of the file names it (UTC, no time zone). */
export interface DateTimeParts {
  year: number;
  /** 1–12 */
  month: number;
  /** 1–31 (1–30 in the 360_day calendar, where every month has 30 days) */
  day: number;
  hour: number;
  minute: number;
  /** May carry a fraction of a second (kept to the millisecond). */
  second: number;
}

/**
 * The calendars of CF 1.11 §4.4.1 that can be decoded, under their canonical names.
 * Aliases (`gregorian`, `365_day`, `366_day`) are mapped by `normalizeCalendar()`.
 */
export type CfCalendar = 'standard' | 'proleptic_gregorian' | 'julian' | 'noleap' | 'all_leap' | '360_day';

/** The time units a `units` attribute may use, after aliases are resolved. */
export type CfTimeUnit = 'seconds' | 'minutes' | 'hours' | 'days' | 'months' | 'years';

/** A parsed `units = "<unit> since <reference datetime>"` attribute. */
export interface CfTimeUnits {
  unit: CfTimeUnit;
  /** Length of one unit in seconds, in the calendar the units were parsed for. */
  secondsPerUnit: number;
  /** The reference datetime, converted to UTC when the attribute carried a time-zone offset. */
  reference: DateTimeParts;
  calendar: CfCalendar;
}

import { CfTimeError } from './cf-time-error';
import { monthKey } from './month-key';
import type { DateTimeParts } from './types';

/** Options for `monthlyAxis()`. */
export interface MonthlyAxisOptions {
  /**
   * When true, skipped months become empty slots (the caller fills them with null);
   * when false (default), a skipped month is an error, since a silent gap shifts every
   * later anomaly or lag if the caller forgets it.
   */
  allowGaps?: boolean;
  /** Name of the time variable, used in messages. */
  variable?: string;
}

/** A time axis placed on consecutive months. */
export interface MonthlyAxis {
  /** First month, "YYYY-MM". */
  start: string;
  /** Number of months from the first to the last, gaps included. */
  length: number;
  /** For each time step of the input, the month slot (0-based from `start`) it occupies. */
  slotOfStep: Int32Array;
  /** Months with no time step ("YYYY-MM"); empty unless `allowGaps`. */
  gaps: string[];
}

/**
 * Checks that decoded times form a monthly axis — one value per month, months increasing —
 * and maps each time step to a month slot. Duplicate, out-of-order and (unless `allowGaps`)
 * skipped months throw a `CfTimeError` naming the indexes and dates.
 * Which instant stands for the month (start, middle or bounds midpoint) is the caller's choice.
 */
export function monthlyAxis(times: readonly DateTimeParts[], options: MonthlyAxisOptions = {}): MonthlyAxis {
  const name = options.variable ?? 'time';
  if (times.length === 0) throw new CfTimeError('not-monthly', `${name} has no values, so there are no months`);
  const first = monthIndex(times[0]);
  const slotOfStep = new Int32Array(times.length);
  const gaps: string[] = [];
  for (let i = 1; i < times.length; i++) {
    const prev = monthIndex(times[i - 1]);
    const cur = monthIndex(times[i]);
    const at = (k: number) => `index ${k} (${formatDate(times[k])})`;
    if (cur === prev) {
      throw new CfTimeError('not-monthly', `${name} is not monthly: ${at(i - 1)} and ${at(i)} fall in the same month ${monthKey(times[i])}; expected one value per month`, i);
    }
    if (cur < prev) {
      throw new CfTimeError('not-monthly', `${name} is not in time order: ${at(i)} comes after ${at(i - 1)} but is earlier`, i);
    }
    if (cur > prev + 1) {
      const missing = cur - prev - 1;
      if (!options.allowGaps) {
        throw new CfTimeError('not-monthly', `${name} skips ${missing} month(s) between ${at(i - 1)} and ${at(i)} (first missing: ${keyOf(prev + 1)}); expected consecutive months`, i);
      }
      for (let m = prev + 1; m < cur; m++) gaps.push(keyOf(m));
    }
    slotOfStep[i] = cur - first;
  }
  return { start: monthKey(times[0]), length: monthIndex(times[times.length - 1]) - first + 1, slotOfStep, gaps };
}

function monthIndex(d: DateTimeParts): number {
  return d.year * 12 + (d.month - 1);
}

function keyOf(index: number): string {
  const year = Math.floor(index / 12);
  return monthKey({ year, month: index - year * 12 + 1 });
}

function formatDate(d: DateTimeParts): string {
  const p = (n: number) => String(Math.floor(n)).padStart(2, '0');
  return `${monthKey(d)}-${p(d.day)} ${p(d.hour)}:${p(d.minute)}:${p(d.second)}`;
}

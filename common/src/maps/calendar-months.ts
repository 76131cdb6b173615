import { AnalysisInputError } from '../series/analysis-input-error';

const INITIALS = 'JFMAMJJASOND';

/**
 * Which calendar months a map uses, as 12 flags (index 0 = January): all months when `months` is
 * absent; a list of month numbers 1–12; or a season spelt by its month initials in calendar order,
 * wrapping across the year boundary ("DJF", "JJA", "NDJFM"). A season is matched against the
 * initials twice over, so it must name one run of consecutive months (common practice).
 */
export function calendarMonths(months?: readonly number[] | string): Uint8Array {
  const flags = new Uint8Array(12);
  if (months === undefined) return flags.fill(1);
  if (typeof months === 'string') {
    const season = months.toUpperCase();
    const twice = INITIALS + INITIALS;
    const starts = new Set<number>();
    for (let i = 0; i < 12; i++) if (twice.startsWith(season, i)) starts.add(i);
    if (season.length < 2 || season.length > 12 || starts.size !== 1) {
      throw new AnalysisInputError(`months "${months}" is not a season of 2–12 consecutive month initials (e.g. DJF, JJA)`);
    }
    const first = [...starts][0];
    for (let k = 0; k < season.length; k++) flags[(first + k) % 12] = 1;
    return flags;
  }
  if (months.length === 0) throw new AnalysisInputError('months is empty: give month numbers 1–12 or a season such as DJF');
  for (const m of months) {
    if (!Number.isInteger(m) || m < 1 || m > 12) throw new AnalysisInputError(`month ${m} is not a month number 1–12`);
    flags[m - 1] = 1;
  }
  return flags;
}

import { roundHalfAway } from './round-half-away';
/** Strength classes of an ENSO event by its peak |index|. */
export type EventStrength = 'weak' | 'moderate' | 'strong' | 'very strong';

/**
 * Strength class by peak |value|: weak from 0.5, moderate from 1.0, strong from 1.5, very strong
 * from 2.0 (°C for the ONI). Common practice — widely used for the ONI, but not an official NOAA CPC
 * category and without a formal source. Values below 0.5 are still called weak (an event found
 * with a lower threshold).
 */
export function eventStrength(peakAbs: number): EventStrength {
  if (peakAbs >= 2) return 'very strong';
  if (peakAbs >= 1.5) return 'strong';
  if (peakAbs >= 1) return 'moderate';
  return 'weak';
}

/** Thresholds of the strength classes, weakest first (common practice, as eventStrength). */
const CLASS_THRESHOLDS: [number, EventStrength][] = [
  [2, 'very strong'],
  [1.5, 'strong'],
  [1, 'moderate'],
];

/**
 * Strength class by the highest class threshold the event's index meets (|value| at or beyond it,
 * on the event's side) in at least `seasons` consecutive overlapping seasons (default 3), rather than
 * by a single peak value; values are compared after roundHalfAway to `roundTo` decimals when given,
 * as the published index tables are. `values` are the event's months in order, signed (+1 warm,
 * −1 cold by `phase`). An event meeting no higher class for long enough is weak. Common practice
 * (the class boundaries have no formal source; the three-season persistence mirrors how the
 * classes are usually applied to the ONI [memory]).
 */
export function sustainedStrength(values: ArrayLike<number>, phase: 1 | -1, options: { seasons?: number; roundTo?: number } = {}): EventStrength {
  const seasons = options.seasons ?? 3;
  for (const [threshold, strength] of CLASS_THRESHOLDS) {
    let run = 0;
    for (let i = 0; i < values.length; i++) {
      const raw = phase * values[i];
      const v = options.roundTo === undefined || raw !== raw ? raw : roundHalfAway(raw, options.roundTo);
      run = v >= threshold ? run + 1 : 0;
      if (run >= seasons) return strength;
    }
  }
  return 'weak';
}

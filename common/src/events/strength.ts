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

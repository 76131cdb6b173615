import type { UsedSeries } from '../figure-kinds/shared/result-parts';

/** The minus sign typeset in journals (U+2212), not the hyphen. */
export const MINUS = '\u2212';

/** A number at a fixed precision with a true minus sign; "−0.00" never appears. */
export function formatValue(value: number, precision: number): string {
  const digits = Math.min(6, Math.max(0, Math.round(precision)));
  const text = new Intl.NumberFormat('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits }).format(Math.abs(value));
  // A value that rounds to zero prints without a sign.
  return value < 0 && /[1-9]/.test(text) ? `${MINUS}${text}` : text;
}

/** How a live number reads in the text. */
export type LiveNumberText =
  | { state: 'value'; text: string }
  | { state: 'unavailable'; text: string };

/** A live number's text: value at its precision followed by its units, or the unavailable marker. */
export function formatLiveNumber(value: number | null | undefined, precision: number, units: string): LiveNumberText {
  if (value === null || value === undefined || !Number.isFinite(value)) return { state: 'unavailable', text: 'n/a' };
  const number = formatValue(value, precision);
  const u = units.trim();
  if (!u) return { state: 'value', text: number };
  // SI writes a space between number and unit; the degree sign of angles is the exception.
  return { state: 'value', text: u === '°' ? `${number}°` : `${number}\u00a0${u}` };
}

/** "DIC 0–100 m v3, Niño index v5": the versions a figure was computed from. */
export function formatVersionsUsed(used: UsedSeries[]): string {
  if (used.length === 0) return 'no stored series';
  return used.map((u) => `${u.name} v${u.version}${u.origin === 'model-output' ? ' (model output)' : ''}`).join(', ');
}

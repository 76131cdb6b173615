import type { CsvDecimalSeparator } from '@upwell/common';

/** Result of reading one cell: a value, missing, or text that is no number. */
export type CellValue = { kind: 'value'; value: number } | { kind: 'missing' } | { kind: 'text' };

/** How missing values are written in a file, and its decimal separator. */
export interface NumberRules {
  decimalSeparator: CsvDecimalSeparator;
  /** Compared case-insensitively with the trimmed cell. */
  missingMarkers: readonly string[];
  /** Compared as numbers, so `-999.0` and `-999` both match the sentinel -999. */
  sentinels: readonly number[];
}

const POINT_NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;
const COMMA_NUMBER = /^[+-]?(\d+(,\d*)?|,\d+)([eE][+-]?\d+)?$/;

/** Builds the one rule for missing values used by every cell of an import: markers, then sentinels, else a number. */
export function numberReader(rules: NumberRules): (cell: string) => CellValue {
  const markers = new Set(rules.missingMarkers.map((m) => m.trim().toLowerCase()));
  const sentinels = new Set(rules.sentinels);
  const pattern = rules.decimalSeparator === 'comma' ? COMMA_NUMBER : POINT_NUMBER;
  return (cell) => {
    if (markers.has(cell.toLowerCase())) return { kind: 'missing' };
    if (!pattern.test(cell)) return { kind: 'text' };
    const value = Number(rules.decimalSeparator === 'comma' ? cell.replace(',', '.') : cell);
    // 1e999 matches the pattern but is no finite measurement.
    if (!Number.isFinite(value)) return { kind: 'text' };
    return sentinels.has(value) ? { kind: 'missing' } : { kind: 'value', value };
  };
}

/** True when the cell is written with a decimal comma (e.g. `1,25`), used to detect European exports. */
export function looksDecimalComma(cell: string): boolean {
  return /^[+-]?\d+,\d+$/.test(cell);
}

/** True when the cell is written with a decimal point (e.g. `1.25`). */
export function looksDecimalPoint(cell: string): boolean {
  return /^[+-]?\d*\.\d+([eE][+-]?\d+)?$/.test(cell);
}

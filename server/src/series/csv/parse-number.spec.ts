import { describe, expect, it } from 'vitest';
import { DEFAULT_MISSING_MARKERS, DEFAULT_MISSING_SENTINELS } from '@upwell/common';
import { numberReader } from './parse-number';

const point = numberReader({ decimalSeparator: 'point', missingMarkers: DEFAULT_MISSING_MARKERS, sentinels: DEFAULT_MISSING_SENTINELS });
const comma = numberReader({ decimalSeparator: 'comma', missingMarkers: DEFAULT_MISSING_MARKERS, sentinels: DEFAULT_MISSING_SENTINELS });

describe('numberReader()', () => {
  it('reads plain, signed, exponent and leading-dot numbers', () => {
    expect(['1', '-2.5', '+3', '.5', '5.', '1e-3', '2.5E+2'].map(point)).toEqual(
      [1, -2.5, 3, 0.5, 5, 0.001, 250].map((value) => ({ kind: 'value', value })),
    );
  });

  it('treats empty, NaN, NA and nan (any case) as missing', () => {
    expect(['', 'NaN', 'NA', 'nan', 'NAN', 'na'].map((c) => point(c).kind)).toEqual(Array(6).fill('missing'));
  });

  it('compares sentinels as numbers: -999.0, -999 and -9.99e2 all match -999', () => {
    expect(['-999', '-999.0', '-9.99e2', '-99.99', '-99.9', '-9999.000'].map((c) => point(c).kind)).toEqual(Array(6).fill('missing'));
    // Near a sentinel is not the sentinel.
    expect(point('-99.98')).toEqual({ kind: 'value', value: -99.98 });
  });

  it('reads decimal commas only in comma mode', () => {
    expect(comma('-0,42')).toEqual({ kind: 'value', value: -0.42 });
    expect(comma('-999,0').kind).toBe('missing');
    expect(comma('0.42').kind).toBe('text');
    expect(point('-0,42').kind).toBe('text');
  });

  it('refuses text, thousands separators and overflowing numbers', () => {
    expect(['n/a?', '1,234.5', '1 000', 'Infinity', '1e999', '0x10', '--1'].map((c) => point(c).kind)).toEqual(Array(7).fill('text'));
  });

  it('uses the markers and sentinels it is given instead of the defaults', () => {
    const custom = numberReader({ decimalSeparator: 'point', missingMarkers: ['--'], sentinels: [0] });
    expect(['--', '0', '0.0', 'NA', '-999'].map((c) => custom(c).kind)).toEqual(['missing', 'missing', 'missing', 'text', 'value']);
  });
});

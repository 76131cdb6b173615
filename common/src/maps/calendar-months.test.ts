import { describe, expect, it } from 'vitest';
import { calendarMonths } from './calendar-months';

const on = (f: Uint8Array) => [...f].flatMap((v, i) => (v ? [i + 1] : []));

describe('calendarMonths()', () => {
  it('selects every month when none are given', () => {
    expect(on(calendarMonths())).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
  });

  it('reads DJF across the year boundary and JJA in the middle (common practice season names)', () => {
    expect(on(calendarMonths('DJF'))).toEqual([1, 2, 12]);
    expect(on(calendarMonths('jja'))).toEqual([6, 7, 8]);
    expect(on(calendarMonths('NDJFM'))).toEqual([1, 2, 3, 11, 12]);
  });

  it('takes a list of month numbers', () => {
    expect(on(calendarMonths([12, 1]))).toEqual([1, 12]);
  });

  it('refuses ambiguous or unknown seasons and bad month numbers', () => {
    expect(() => calendarMonths('J')).toThrow(/season/);
    expect(() => calendarMonths('JAJ')).toThrow(/season/);
    expect(() => calendarMonths([0])).toThrow(/1–12/);
    expect(() => calendarMonths([])).toThrow(/empty/);
  });
});

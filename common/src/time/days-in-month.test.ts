import { describe, expect, it } from 'vitest';
import { daysInMonth } from './days-in-month';

describe('daysInMonth() (CF 1.11 §4.4.1 leap rules)', () => {
  it('February follows each calendar rule', () => {
    expect(daysInMonth(1900, 2, 'proleptic_gregorian')).toBe(28); // divisible by 100, not 400
    expect(daysInMonth(2000, 2, 'proleptic_gregorian')).toBe(29); // divisible by 400
    expect(daysInMonth(1900, 2, 'julian')).toBe(29);
    expect(daysInMonth(1500, 2, 'standard')).toBe(29); // Julian part
    expect(daysInMonth(1700, 2, 'standard')).toBe(28); // Gregorian part
    expect(daysInMonth(2000, 2, 'noleap')).toBe(28);
    expect(daysInMonth(2001, 2, 'all_leap')).toBe(29);
    expect(daysInMonth(2001, 2, '360_day')).toBe(30);
  });

  it('other months are the usual lengths, 30 in 360_day', () => {
    expect([1, 4, 12].map((m) => daysInMonth(2001, m, 'standard'))).toEqual([31, 30, 31]);
    expect(daysInMonth(2001, 1, '360_day')).toBe(30);
  });
});

import { describe, expect, it } from 'vitest';
import { calendarDaysInMonth } from './calendar-days-in-month';

describe('calendarDaysInMonth() (CF 1.11 §4.4.1 leap rules)', () => {
  it('February follows each calendar rule', () => {
    expect(calendarDaysInMonth(1900, 2, 'proleptic_gregorian')).toBe(28); // divisible by 100, not 400
    expect(calendarDaysInMonth(2000, 2, 'proleptic_gregorian')).toBe(29); // divisible by 400
    expect(calendarDaysInMonth(1900, 2, 'julian')).toBe(29);
    expect(calendarDaysInMonth(1500, 2, 'standard')).toBe(29); // Julian part
    expect(calendarDaysInMonth(1700, 2, 'standard')).toBe(28); // Gregorian part
    expect(calendarDaysInMonth(2000, 2, 'noleap')).toBe(28);
    expect(calendarDaysInMonth(2001, 2, 'all_leap')).toBe(29);
    expect(calendarDaysInMonth(2001, 2, '360_day')).toBe(30);
  });

  it('other months are the usual lengths, 30 in 360_day', () => {
    expect([1, 4, 12].map((m) => calendarDaysInMonth(2001, m, 'standard'))).toEqual([31, 30, 31]);
    expect(calendarDaysInMonth(2001, 1, '360_day')).toBe(30);
  });
});

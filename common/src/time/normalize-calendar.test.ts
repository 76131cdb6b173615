import { describe, expect, it } from 'vitest';
import { normalizeCalendar } from './normalize-calendar';

describe('normalizeCalendar() (CF 1.11 §4.4.1)', () => {
  it.each([
    ['standard', 'standard'],
    ['gregorian', 'standard'],
    ['Gregorian', 'standard'],
    ['proleptic_gregorian', 'proleptic_gregorian'],
    ['julian', 'julian'],
    ['noleap', 'noleap'],
    ['365_day', 'noleap'],
    ['all_leap', 'all_leap'],
    ['366_day', 'all_leap'],
    ['360_day', '360_day'],
  ])('maps "%s" to %s', (name, expected) => {
    expect(normalizeCalendar(name)).toBe(expected);
  });

  it('treats a missing or blank attribute as the default, standard', () => {
    expect(normalizeCalendar(undefined)).toBe('standard');
    expect(normalizeCalendar('  ')).toBe('standard');
  });

  it('refuses "none" and unknown names with a message naming them', () => {
    expect(() => normalizeCalendar('none')).toThrow(/calendar "none"/);
    expect(() => normalizeCalendar('lunar')).toThrow(/unknown calendar "lunar"/);
  });
});

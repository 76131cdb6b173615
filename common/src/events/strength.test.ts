import { describe, expect, it } from 'vitest';
import { eventStrength } from './strength';

// Classes by peak |index| at 0.5 / 1.0 / 1.5 / 2.0: common practice for the ONI, not an official CPC category (no formal source).
describe('eventStrength() (common practice, no formal source)', () => {
  it('classes 0.5–0.9 weak, 1.0–1.4 moderate, 1.5–1.9 strong, ≥ 2.0 very strong', () => {
    expect(eventStrength(0.5)).toBe('weak');
    expect(eventStrength(0.99)).toBe('weak');
    expect(eventStrength(1.0)).toBe('moderate');
    expect(eventStrength(1.49)).toBe('moderate');
    expect(eventStrength(1.5)).toBe('strong');
    expect(eventStrength(1.99)).toBe('strong');
    expect(eventStrength(2.0)).toBe('very strong');
    expect(eventStrength(2.64)).toBe('very strong');
  });
});

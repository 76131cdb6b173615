import { describe, expect, it } from 'vitest';
import { detectEvents } from './detect-events';
import { eventStrength, sustainedStrength } from './strength';

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

describe('sustainedStrength() — the class threshold met in ≥ 3 consecutive overlapping seasons', () => {
  // Mechanism test on constructed values (science.md: do not use remembered table values as check values).
  it('needs three consecutive seasons at the class threshold: one 2.4 peak among 1.6s is strong, not very strong', () => {
    expect(sustainedStrength([0.6, 1.6, 1.7, 2.4, 1.6, 0.9], 1)).toBe('strong');
    expect(sustainedStrength([0.6, 2.0, 2.1, 2.4, 1.6, 0.9], 1)).toBe('very strong');
    expect(sustainedStrength([0.6, 1.2, 0.9, 1.4, 1.3, 0.7], 1)).toBe('weak');
  });

  it('works on the cold side with the sign of the phase', () => {
    expect(sustainedStrength([-0.7, -1.1, -1.2, -1.0, -0.6], -1)).toBe('moderate');
    expect(sustainedStrength([-0.7, -1.1, -1.2, -1.0, -0.6], 1)).toBe('weak');
  });

  it('compares rounded values when roundTo is set (0.96 rounds to 1.0 at one decimal)', () => {
    const v = [0.7, 0.96, 1.04, 0.97, 0.6];
    expect(sustainedStrength(v, 1)).toBe('weak');
    expect(sustainedStrength(v, 1, { roundTo: 1 })).toBe('moderate');
  });

  it('is used by detectEvents() with strengthRule "sustained" (the default stays the peak rule)', () => {
    const values = [0, 0.6, 1.6, 1.7, 2.4, 1.6, 0.9, 0];
    expect(detectEvents({ index: { start: '2000-01', values } }).events[0].strength).toBe('very strong');
    expect(detectEvents({ index: { start: '2000-01', values }, strengthRule: 'sustained' }).events[0].strength).toBe('strong');
  });
});

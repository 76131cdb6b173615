import { describe, expect, it } from 'vitest';
import { budgetColour, BUDGET_COLOURS, canonicalTerm } from './budget-colours';
import { canonicalJSON } from './canonical-json';
import { formatLiveNumber, formatValue, formatVersionsUsed, MINUS } from './format';
import { used } from './test-data';

describe('formatLiveNumber', () => {
  it('prints the value at its precision with a true minus sign (U+2212) and its units', () => {
    const f = formatLiveNumber(-0.4213, 2, 'Pg C');
    expect(f).toEqual({ state: 'value', text: `${MINUS}0.42\u00a0Pg C` });
    expect(f.text.charCodeAt(0)).toBe(0x2212);
    expect(f.text).not.toContain('-');
  });

  it('rounds to the precision asked, including none', () => {
    expect(formatLiveNumber(1.005, 0, 'Pg C').text).toBe('1\u00a0Pg C');
    expect(formatLiveNumber(2.71828, 3, '').text).toBe('2.718');
    expect(formatLiveNumber(12345.678, 1, 'Tg C').text).toBe('12,345.7\u00a0Tg C');
  });

  it('never prints "−0.00" for a value that rounds to zero', () => {
    expect(formatValue(-0.001, 2)).toBe('0.00');
    expect(formatValue(-0.006, 2)).toBe(`${MINUS}0.01`);
  });

  it('marks null, undefined and non-finite values as unavailable', () => {
    expect(formatLiveNumber(null, 2, 'Pg C')).toEqual({ state: 'unavailable', text: 'n/a' });
    expect(formatLiveNumber(undefined, 2, 'Pg C').state).toBe('unavailable');
    expect(formatLiveNumber(Number.NaN, 2, 'Pg C').state).toBe('unavailable');
  });

  it('clamps a precision outside 0–6', () => {
    expect(formatValue(1.23456789, 12)).toBe('1.234568');
    expect(formatValue(1.6, -3)).toBe('2');
  });
});

describe('formatVersionsUsed', () => {
  it('names each series with its version and says when it is model output', () => {
    expect(formatVersionsUsed([used(), used({ name: 'Index', version: 5, origin: 'observation' })])).toBe('DIC 0–100 m v3 (model output), Index v5');
    expect(formatVersionsUsed([])).toBe('no stored series');
  });
});

describe('budget colours', () => {
  it('gives each canonical term its fixed colour whatever the spelling', () => {
    expect(canonicalTerm('Air-sea flux')).toBe('air–sea flux');
    expect(budgetColour('Air-sea flux')).toBe(BUDGET_COLOURS['air–sea flux']);
    expect(budgetColour(' Biology ')).toBe(BUDGET_COLOURS.biology);
  });

  it('keeps one colour for a term of another name, distinct from the canonical ones', () => {
    expect(budgetColour('entrainment')).toBe(budgetColour('Entrainment'));
    expect(Object.values(BUDGET_COLOURS)).not.toContain(budgetColour('entrainment'));
  });
});

describe('canonicalJSON', () => {
  it('gives the same text for the same recipe whatever the key order', () => {
    expect(canonicalJSON({ b: 1, a: { d: [1, { z: 1, y: 2 }], c: 2 } })).toBe(canonicalJSON({ a: { c: 2, d: [1, { y: 2, z: 1 }] }, b: 1 }));
    expect(canonicalJSON({ a: 1, b: undefined })).toBe('{"a":1}');
  });
});

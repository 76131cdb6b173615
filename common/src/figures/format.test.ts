import { describe, expect, it } from 'vitest';
import { formatLiveNumber, formatValue, formatVersionsUsed, MINUS } from './format';
import { used } from '../../test-fixtures/figure-results';

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

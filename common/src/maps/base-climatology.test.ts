import { describe, expect, it } from 'vitest';
import { parseMonth } from '../series/month';
import { baseClimatology } from './base-climatology';

describe('baseClimatology()', () => {
  it('reads only base months the field holds, and counts the rest as missing years with a warning', () => {
    const read: number[] = [];
    const source = { first: parseMonth('2000-01'), last: parseMonth('2000-12'), cells: 1, read: (m: number, out: Float64Array) => (read.push(m), (out[0] = m % 12), true) };
    const short = baseClimatology(source, parseMonth('2000-01'), parseMonth('2001-12'), undefined, new Float64Array(1));
    expect(read.length).toBe(12);
    expect(short.warnings[0]).toMatch(/only part of the base period/);
    expect(Number.isNaN(short.climatology[0])).toBe(true); // 1 of 2 Januaries < 80 %
    const lenient = baseClimatology(source, parseMonth('2000-01'), parseMonth('2001-12'), 1, new Float64Array(1));
    expect(lenient.climatology[3]).toBe(3);
  });
});

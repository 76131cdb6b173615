import { describe, expect, it } from 'vitest';
import { monthlyClimatology } from '../series/climatology-monthly';
import { baseMonthStats } from '../series/base-month-stats';
import { parseMonth } from '../series/month';
import { cellClimatology } from './cell-climatology';

// Check: per cell, the series rule (series/climatology-monthly.ts, WMO-No. 1203 80 % rule) on that cell's series.
describe('cellClimatology()', () => {
  const from = parseMonth('2000-01');
  const to = parseMonth('2009-12');
  const series = [
    Array.from({ length: 120 }, (_, i) => 10 + (i % 12) + 0.1 * Math.floor(i / 12)),
    Array.from({ length: 120 }, (_, i) => (i % 12 === 1 && i > 40 ? NaN : i)), // misses 7 Februaries
  ];

  it('equals the series climatology of every cell, including a month failing the 80 % rule', () => {
    const acc = cellClimatology(2, from, to);
    for (let i = 0; i < 120; i++) acc.add([series[0][i], series[1][i]], from + i);
    const { climatology, warnings } = acc.finish();
    for (let c = 0; c < 2; c++) {
      const expected = monthlyClimatology(baseMonthStats(Float64Array.from(series[c]), from, from, to)).climatology;
      for (let m = 0; m < 12; m++) {
        if (Number.isNaN(expected[m])) expect(Number.isNaN(climatology[m * 2 + c])).toBe(true);
        else expect(climatology[m * 2 + c]).toBeCloseTo(expected[m], 12);
      }
    }
    expect(Number.isNaN(climatology[1 * 2 + 1])).toBe(true);
    expect(warnings).toEqual([expect.stringMatching(/Feb is null at 1 of 2 cells.*minYears = 8 of 10/)]);
  });

  it('ignores slices outside the base period and honours an explicit minYears and a mask', () => {
    const acc = cellClimatology(2, from, from + 23, Uint8Array.of(0, 1));
    acc.add([5, 5], from - 1);
    acc.add([1, 1], from);
    const r = acc.finish(1).climatology;
    expect(r[0]).toBe(1);
    expect(Number.isNaN(r[1])).toBe(true);
    expect(Number.isNaN(acc.finish().climatology[0])).toBe(true); // 1 of 2 Januaries < 80 %
  });
});

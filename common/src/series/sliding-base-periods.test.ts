import { describe, expect, it } from 'vitest';
import { slidingBasePeriods } from './sliding-base-periods';

// NOAA CPC "ONI_change" page (science.md): 1950–1955 use 1936–1965; 2001–2005 use 1986–2015; real time the latest 30 years.
describe('slidingBasePeriods() (centred 30-year bases updated every 5 years)', () => {
  const blocks = slidingBasePeriods(1950, 2024, [1854, 2024]);
  const baseOf = (year: number) => blocks.find((b) => b.years[0] <= year && year <= b.years[1])!.base;

  it('gives CPC’s examples: 1950–1955 → 1936–1965, 2001–2005 → 1986–2015', () => {
    for (const y of [1950, 1951, 1955]) expect(baseOf(y)).toEqual([1936, 1965]);
    for (const y of [2001, 2005]) expect(baseOf(y)).toEqual([1986, 2015]);
    expect(baseOf(1956)).toEqual([1941, 1970]);
  });

  it('uses the latest 30 complete years when the centred base would reach past the data (real time)', () => {
    expect(baseOf(2016)).toEqual([1995, 2024]);
    expect(baseOf(2024)).toEqual([1995, 2024]);
    expect(baseOf(2006)).toEqual([1991, 2020]);
  });

  it('shifts forward at the start of a short record, and covers every year once', () => {
    const short = slidingBasePeriods(1998, 2040, [1998, 2040]);
    expect(short[0]).toEqual({ years: [1998, 2005], base: [1998, 2027] });
    const years = short.flatMap((b) => Array.from({ length: b.years[1] - b.years[0] + 1 }, (_, i) => b.years[0] + i));
    expect(years).toEqual(Array.from({ length: 43 }, (_, i) => 1998 + i));
    expect(slidingBasePeriods(2000, 2010, [2000, 2010]).every((b) => b.base[0] === 2000 && b.base[1] === 2010)).toBe(true);
  });
});

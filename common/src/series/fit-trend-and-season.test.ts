import { describe, expect, it } from 'vitest';
import { fixtureText } from '../../test-fixtures/read-fixture';
import { fitTrendAndSeason } from './fit-trend-and-season';
import { parseMonth } from './month';
import { toFloat64 } from './to-float64';

// Reference: common/test-fixtures/scripts/joint-trend-season.py — statsmodels 0.13.5 OLS of y on
// 12 month dummies and the month index (Thoning, Tans & Komhyr 1989 fit CO2 this way).
const ref = JSON.parse(fixtureText('joint-trend-season.json'));

describe('fitTrendAndSeason() (one least-squares fit of a line and 12 monthly means, Thoning et al. 1989)', () => {
  for (const name of ['co2Like', 'nino12'] as const) {
    it(`matches statsmodels OLS with month dummies on ${name}: slope, monthly intercepts, residuals`, () => {
      const r = ref[name];
      const x = toFloat64(r.values ?? []);
      const values: (number | null)[] = r.values ?? [];
      const series = name === 'nino12' ? toFloat64(ninoValues()) : x;
      const fit = fitTrendAndSeason(series, parseMonth(r.start), { kind: 'monthly-mean' })!;
      expect(fit.slope).toBeCloseTo(r.slopePerMonth, 10);
      fit.seasonal.forEach((s, m) => expect(s).toBeCloseTo(r.monthlyIntercepts[m], 8));
      const cal0 = parseMonth(r.start) % 12;
      r.residuals.forEach((e: number | null, i: number) => {
        if (e === null) return expect(values[i] ?? null).toBeNull();
        expect(series[i] - fit.seasonal[(cal0 + i) % 12] - fit.slope * i).toBeCloseTo(e, 8);
      });
    });
  }

  it('leaves no month without a line: null for one value per calendar month or fewer than two values', () => {
    expect(fitTrendAndSeason(Float64Array.from([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]), 0, { kind: 'monthly-mean' })).toBeNull();
    expect(fitTrendAndSeason(Float64Array.from([1]), 0, { kind: 'monthly-mean' })).toBeNull();
    expect(fitTrendAndSeason(new Float64Array(0), 0, { kind: 'harmonic', harmonics: 2 })).toBeNull();
  });

  it('recovers an exact line plus a two-harmonic cycle with the harmonic model', () => {
    const x = Float64Array.from({ length: 120 }, (_, i) => 5 + 0.1 * i + 2 * Math.cos((2 * Math.PI * (i + 3)) / 12) + 0.5 * Math.sin((4 * Math.PI * (i + 3)) / 12));
    const fit = fitTrendAndSeason(x, parseMonth('2000-04'), { kind: 'harmonic', harmonics: 2 })!;
    expect(fit.slope).toBeCloseTo(0.1, 12);
    for (let m = 0; m < 12; m++) expect(fit.seasonal[m]).toBeCloseTo(5 + 2 * Math.cos((2 * Math.PI * m) / 12) + 0.5 * Math.sin((4 * Math.PI * m) / 12), 10);
  });
});

/** The Niño 1+2 table as the fixture script reads it, in months from 1950-01. */
function ninoValues(): number[] {
  return fixtureText('elnino-nino12-1950-2010.csv')
    .trim()
    .split('\n')
    .slice(1)
    .flatMap((line) => line.split(',').slice(1).map(Number));
}

import { describe, expect, it } from 'vitest';
import { UnitError } from '../units/unit-error';
import { AnalysisInputError } from './analysis-input-error';
import { integrate } from './integrate';

describe('integrate()', () => {
  it('integrates 1 Pg C/yr over January as 31/365.25 Pg C (Julian year, true month length)', () => {
    const res = integrate({ series: { start: '2001-01', values: [1] }, units: 'PgC/yr', from: '2001-01', to: '2001-01' });
    expect(res.total).toBeCloseTo(31 / 365.25, 15);
    expect(res.units).toBe('Pg C');
  });

  it('integrates a constant 2 Pg C yr-1 over a leap year 2000 as 2·366/365.25 and over 2001 as 2·365/365.25', () => {
    const values = new Array(24).fill(2);
    expect(integrate({ series: { start: '2000-01', values }, units: 'Pg C yr-1', from: '2000-01', to: '2000-12' }).total).toBeCloseTo((2 * 366) / 365.25, 14);
    expect(integrate({ series: { start: '2000-01', values }, units: 'Pg C yr-1', from: '2001-01', to: '2001-12' }).total).toBeCloseTo((2 * 365) / 365.25, 14);
  });

  it('integrates a per-second flux with February 2001 = 28 × 86400 s and keeps the per-area part of the unit', () => {
    const res = integrate({ series: { start: '2001-02', values: [1e-8] }, units: 'mol C m-2 s-1', from: '2001-02', to: '2001-02' });
    expect(res.total).toBeCloseTo(1e-8 * 28 * 86400, 15);
    expect(res.units).toBe('mol C m-2');
  });

  it('treats "month" as the mean month of 30.4375 days (so January at 1 Tg C/month gives 31/30.4375 Tg C)', () => {
    const res = integrate({ series: { start: '2001-01', values: [1] }, units: 'Tg C/month', from: '2001-01', to: '2001-01' });
    expect(res.total).toBeCloseTo(31 / 30.4375, 14);
  });

  it('refuses missing months inside the period, naming them', () => {
    expect(() => integrate({ series: { start: '2001-01', values: [1, null, 1] }, units: 'PgC/yr', from: '2001-01', to: '2001-03' })).toThrow(
      /missing months 2001-02/,
    );
  });

  it('refuses a period outside the series or reversed, and a unit that is not a rate', () => {
    const series = { start: '2001-01', values: [1, 1] };
    expect(() => integrate({ series, units: 'PgC/yr', from: '2000-12', to: '2001-01' })).toThrow(AnalysisInputError);
    expect(() => integrate({ series, units: 'PgC/yr', from: '2001-02', to: '2001-01' })).toThrow(AnalysisInputError);
    expect(() => integrate({ series, units: 'Pg C', from: '2001-01', to: '2001-01' })).toThrow(UnitError);
  });
});

describe('integrate() in the series calendar (CF 1.11 §4.4.1)', () => {
  // Month lengths checked against cftime in time/calendar-days-in-month.test.ts (cf-month-lengths.py).
  const body = { series: { start: '1997-01', values: Array(24).fill(1) }, units: 'Pg C/yr', from: '1997-05', to: '1998-05' };
  it('integrates 13 months of 1 Pg C/yr as 390/365.25 in 360_day, 396/365.25 in noleap and standard (1997–98 has no 29 February)', () => {
    expect(integrate({ ...body, calendar: '360_day' }).total).toBeCloseTo(390 / 365.25, 14);
    expect(integrate({ ...body, calendar: 'noleap' }).total).toBeCloseTo(396 / 365.25, 14);
    expect(integrate(body).total).toBeCloseTo(396 / 365.25, 14);
  });

  it('counts February 2000 as 29 days in standard and all_leap, 28 in noleap / 365_day, 30 in 360_day', () => {
    const feb = { series: { start: '2000-02', values: [86400] }, units: 'mol C s-1', from: '2000-02', to: '2000-02' };
    expect(integrate({ ...feb }).total).toBe(29 * 86400 * 86400);
    expect(integrate({ ...feb, calendar: 'all_leap' }).total).toBe(29 * 86400 * 86400);
    expect(integrate({ ...feb, calendar: '365_day' }).total).toBe(28 * 86400 * 86400);
    expect(integrate({ ...feb, calendar: '360_day' }).total).toBe(30 * 86400 * 86400);
  });

  it('refuses an unknown calendar with a CfTimeError naming it', () => {
    expect(() => integrate({ ...body, calendar: 'lunar' })).toThrow(/lunar/);
  });
});

import { describe, expect, it } from 'vitest';
import { CARBON_MOLAR_MASS } from '@upwell/common';
import { carbonChange, planCarbonChange } from './carbon-change';

const year2001 = { start: '2001-01', values: Array(12).fill(1) };

describe('planCarbonChange()', () => {
  it('integrates carbon rates and differences carbon amounts', () => {
    expect(planCarbonChange('Pg C/yr')).toMatchObject({ treatment: 'rate-integrated', toPgC: 1 });
    expect(planCarbonChange('mol C s-1').treatment).toBe('rate-integrated');
    expect(planCarbonChange('Pg C')).toMatchObject({ treatment: 'inventory-difference', toPgC: 1 });
    // 1 Tg C = 1e-3 Pg C.
    expect(planCarbonChange('Tg C').toPgC).toBeCloseTo(1e-3, 15);
  });

  it('refuses units that are neither, naming the unit', () => {
    for (const u of ['degC', 'mol C m-2 s-1', 'mmol m-3', '']) {
      const plan = planCarbonChange(u);
      expect(plan.treatment, u).toBeNull();
      expect(plan.reason, u).toContain(`"${u}"`);
    }
  });
});

describe('carbonChange()', () => {
  it('a constant anomaly of 1 Pg C/yr over the 365 days of 2001 is 365/365.25 Pg C (Julian year, science.md)', () => {
    const c = carbonChange(year2001, 'Pg C/yr', planCarbonChange('Pg C/yr'), { start: '2001-01', end: '2001-12' });
    expect(c.value).toBeCloseTo(365 / 365.25, 12);
    expect(c.warning).toBeNull();
  });

  it('1 mol C/s over January is 31·86400 mol C = 31·86400·12.011 g C (CIAAW conventional weight) in Pg C', () => {
    const c = carbonChange(year2001, 'mol C s-1', planCarbonChange('mol C s-1'), { start: '2001-01', end: '2001-01' });
    expect(c.value).toBeCloseTo((31 * 86400 * CARBON_MOLAR_MASS) / 1e15, 20);
  });

  // Issue 14 item 2 changed this rule (it was: anomaly at the end month minus anomaly at the start month, one month short).
  it('an inventory change runs from the start of the first month to the end of the last (boundaries between monthly means), in Pg C', () => {
    const inv = { start: '2001-01', values: [1, 5, 3, 7000, 9000] };
    // Boundaries weighted by the neighbours' lengths (common/src/series/inventory-change.ts): Jan|Feb 31 d, 28 d; Apr|May 30 d, 31 d.
    const before = (1 * 28 + 5 * 31) / 59;
    const after = (7000 * 31 + 9000 * 30) / 61;
    expect(carbonChange(inv, 'Tg C', planCarbonChange('Tg C'), { start: '2001-02', end: '2001-04' }).value).toBeCloseTo((after - before) / 1000, 12);
  });

  it('gives null with a warning for a missing month or an event outside the series', () => {
    const gap = { start: '2001-01', values: [1, null, 1] };
    const plan = planCarbonChange('Pg C/yr');
    expect(carbonChange(gap, 'Pg C/yr', plan, { start: '2001-01', end: '2001-03' })).toMatchObject({ value: null, warning: expect.stringContaining('2001-02') });
    expect(carbonChange(gap, 'Pg C/yr', plan, { start: '2000-06', end: '2001-01' }).value).toBeNull();
    expect(carbonChange(gap, 'Pg C', planCarbonChange('Pg C'), { start: '2001-02', end: '2001-02' }).warning).toContain('2001-02');
  });

  it('gives null with the unit named when the unit is neither a rate nor an amount of carbon', () => {
    expect(carbonChange(year2001, 'degC', planCarbonChange('degC'), { start: '2001-01', end: '2001-12' })).toMatchObject({ value: null, warning: expect.stringContaining('"degC"') });
  });
});

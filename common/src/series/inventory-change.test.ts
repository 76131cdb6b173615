import { describe, expect, it } from 'vitest';
import { AnalysisInputError } from './analysis-input-error';
import { integrate } from './integrate';
import { inventoryChange } from './inventory-change';
import { monthDays, parseMonth } from './month';

/**
 * A flux f(t) (Pg C/yr, t in Julian years from 1995-01-01) and the inventory I(t) = ∫₀ᵗ f, both as
 * exact monthly means: the flux's mean over a month is (I(t1) − I(t0))/(t1 − t0), the inventory's
 * (J(t1) − J(t0))/(t1 − t0) with J = ∫ I. So the inventory is the exact integral of the flux, and the
 * carbon over months from..to is exactly I(end of to) − I(start of from) (analytic reference).
 */
function synthetic(I: (t: number) => number, J: (t: number) => number, calendar: 'standard' | '360_day', months = 72) {
  const edges = [0];
  for (let m = 0; m < months; m++) edges.push(edges[m] + monthDays(parseMonth('1995-01') + m, calendar) / 365.25);
  const flux = [];
  const inventory = [];
  for (let m = 0; m < months; m++) {
    const [t0, t1] = [edges[m], edges[m + 1]];
    flux.push((I(t1) - I(t0)) / (t1 - t0));
    inventory.push((J(t1) - J(t0)) / (t1 - t0));
  }
  const exact = (from: number, to: number) => I(edges[to + 1]) - I(edges[from]);
  return { flux: { start: '1995-01', values: flux }, inventory: { start: '1995-01', values: inventory }, exact };
}

describe('inventoryChange() — the same span as the integrated flux', () => {
  it('equals the integrated flux exactly for a flux linear in time in a 360_day calendar (inventory = exact integral)', () => {
    // f = 2 + 0.3t: I = 2t + 0.15t², J = t² + 0.05t³.
    const s = synthetic((t) => 2 * t + 0.15 * t * t, (t) => t * t + 0.05 * t ** 3, '360_day');
    for (const [from, to] of [['1997-05', '1998-05'], ['1996-01', '1996-06'], ['1999-03', '1999-03']]) {
      const flux = integrate({ series: s.flux, units: 'Pg C/yr', from, to, calendar: '360_day' }).total;
      const inv = inventoryChange({ series: s.inventory, from, to, calendar: '360_day' });
      const exact = s.exact(parseMonth(from) - parseMonth('1995-01'), parseMonth(to) - parseMonth('1995-01'));
      expect(flux).toBeCloseTo(exact, 12);
      expect(inv).toBeCloseTo(exact, 12);
    }
  });

  it('equals the integrated flux exactly for a constant flux in the standard calendar, months of unequal length included', () => {
    const s = synthetic((t) => 1.7 * t, (t) => 0.85 * t * t, 'standard');
    for (const [from, to] of [['1997-02', '1998-02'], ['1996-01', '1996-06']]) {
      const flux = integrate({ series: s.flux, units: 'Pg C/yr', from, to }).total;
      expect(inventoryChange({ series: s.inventory, from, to })).toBeCloseTo(flux, 12);
    }
  });

  it('agrees within 1 % for an ENSO-like flux over 13- and 6-month events, where differencing the two end months falls 8–17 % short', () => {
    // f = sin(2πt/4) (Pg C/yr, a 4-year oscillation): I = (4/2π)(1 − cos(2πt/4)), J = (4/2π)(t − (4/2π)sin(2πt/4)).
    const w = (2 * Math.PI) / 4;
    const s = synthetic((t) => (1 - Math.cos(w * t)) / w, (t) => (t - Math.sin(w * t) / w) / w, 'standard');
    for (const [from, to] of [['1995-09', '1996-09'], ['1995-11', '1996-04']]) {
      const flux = integrate({ series: s.flux, units: 'Pg C/yr', from, to }).total;
      const inv = inventoryChange({ series: s.inventory, from, to });
      expect(Math.abs(inv / flux - 1)).toBeLessThan(0.01);
      const first = parseMonth(from) - parseMonth('1995-01');
      const last = parseMonth(to) - parseMonth('1995-01');
      const oldWay = (s.inventory.values[last] as number) - (s.inventory.values[first] as number);
      expect(1 - oldWay / flux).toBeGreaterThan(0.05);
    }
  });

  it('needs the months either side and names a missing one', () => {
    const series = { start: '2000-01', values: [1, 2, 3, null, 5] };
    expect(inventoryChange({ series, from: '2000-02', to: '2000-02', calendar: '360_day' })).toBeCloseTo((2 + 3 - 1 - 2) / 2, 14);
    expect(() => inventoryChange({ series: { start: '2000-01', values: [1, 2, 3] }, from: '2000-01', to: '2000-02' })).toThrow(/1999-12/);
    expect(() => inventoryChange({ series, from: '2000-02', to: '2000-03' })).toThrow(AnalysisInputError);
    expect(() => inventoryChange({ series, from: '2000-02', to: '2000-03' })).toThrow(/2000-04/);
  });
});

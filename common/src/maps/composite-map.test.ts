import { describe, expect, it } from 'vitest';
import { mapsReference } from '../../test-fixtures/maps-reference';
import { compositeMap } from './composite-map';

// Reference: scipy.stats.ttest_ind(equal_var=False) and ttest_1samp (fixture `welch`, maps_reference.py).
const { welch } = mapsReference();

describe('compositeMap()', () => {
  it('per cell, the event-minus-neutral mean and Welch’s p match scipy', () => {
    const acc = compositeMap(2);
    welch.a.forEach((v) => acc.addEvent([v, v - welch.oneSampleMu]));
    welch.b.forEach((v) => acc.addNeutral([v, NaN]));
    const neutral = acc.finish('neutral');
    const meanA = welch.a.reduce((s, v) => s + v, 0) / welch.a.length;
    const meanB = welch.b.reduce((s, v) => s + v, 0) / welch.b.length;
    expect(neutral.values[0]).toBeCloseTo(meanA - meanB, 12);
    expect(neutral.t[0]).toBeCloseTo(welch.t, 12);
    expect(neutral.p[0]).toBeCloseTo(welch.p, 12);
    expect(Number.isNaN(neutral.values[1])).toBe(true); // no neutral value in cell 1
    const none = acc.finish('none');
    expect(none.p[1]).toBeCloseTo(welch.oneSampleP, 12);
    expect(Array.from(none.nEvent)).toEqual([6, 6]);
  });

  it('leaves p NaN with a single event month', () => {
    const acc = compositeMap(1);
    acc.addEvent([1]);
    const r = acc.finish('none');
    expect(r.values[0]).toBe(1);
    expect(Number.isNaN(r.p[0])).toBe(true);
  });
});

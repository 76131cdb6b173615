import { describe, expect, it } from 'vitest';
import { mapsReference, referenceSource } from '../../test-fixtures/maps-reference';
import { mapComposite } from './map-composite';
import type { MapRequest } from './map-types';
import { mapWindow } from './map-window';

// Reference: maps_reference.py composite() with scipy.stats.ttest_ind(equal_var=False).
const ref = mapsReference();

describe('mapComposite()', () => {
  it('warm minus neutral, peak + 1..3: values and Welch p match scipy to 1e-9, with its month counts', () => {
    const c = ref.cases.find((x) => x.name === 'warm composite, peak + 1..3, minus neutral')!;
    const { source } = referenceSource(ref, 180);
    const req = { ...(c.request as unknown as MapRequest), events: ref.events };
    const r = mapComposite(source, req, mapWindow(source, req));
    c.values.forEach((v, i) => (v === null ? expect(r.values[i]).toBeNaN() : expect(Math.abs(r.values[i] - v)).toBeLessThan(1e-9)));
    c.p!.forEach((v, i) => (v === null ? expect(r.p![i]).toBeNaN() : expect(Math.abs(r.p![i] - v)).toBeLessThan(1e-9)));
    expect(r.counts).toMatchObject({ eventMonths: c.eventMonths, neutralMonths: c.neutralMonths });
    expect(r.warnings.join(' ')).toMatch(/serially correlated/);
  });

  it('refuses a request without events or without an event of the phase', () => {
    const { source } = referenceSource(ref, 180);
    const req: MapRequest = { mode: 'composite' };
    expect(() => mapComposite(source, req, mapWindow(source, req))).toThrow(/event set/);
    const cold: MapRequest = { mode: 'composite', events: ref.events.filter((e) => e.phase === 'warm'), phase: 'cold' };
    expect(() => mapComposite(source, cold, mapWindow(source, cold))).toThrow(/no cold event/);
  });
});

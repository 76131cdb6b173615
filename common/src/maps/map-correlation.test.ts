import { describe, expect, it } from 'vitest';
import { mapsReference, referenceSource } from '../../test-fixtures/maps-reference';
import { mapCorrelation } from './map-correlation';
import type { MapRequest } from './map-types';
import { mapWindow } from './map-window';

// Reference: maps_reference.py correlation_map() (numpy corrcoef/polyfit, Bretherton nEff, scipy t.sf).
const ref = mapsReference();

describe('mapCorrelation()', () => {
  it('regression at lag 2 gives numpy’s slopes (field units per index unit) to 1e-9', () => {
    const c = ref.cases.find((x) => x.name === 'regression, lag 2')!;
    const { source } = referenceSource(ref, 180);
    const req = { ...(c.request as unknown as MapRequest), index: ref.index };
    const r = mapCorrelation(source, req, mapWindow(source, req));
    c.values.forEach((v, i) => (v === null ? expect(r.values[i]).toBeNaN() : expect(Math.abs(r.values[i] - v)).toBeLessThan(1e-9)));
  });

  it('refuses phase-randomised p with a month selection or an index with gaps in the window', () => {
    const { source } = referenceSource(ref, 180);
    const base = { from: '2000-01', to: '2009-12' };
    const djf: MapRequest = { mode: 'correlation', base, months: 'DJF', index: ref.index, significance: 'phase-randomised' };
    expect(() => mapCorrelation(source, djf, mapWindow(source, djf))).toThrow(/consecutive months/);
    const gappy: MapRequest = { mode: 'correlation', base, index: ref.index, significance: 'phase-randomised', surrogates: 10 };
    expect(() => mapCorrelation(source, gappy, mapWindow(source, gappy))).toThrow(/every month of the period/);
    expect(() => mapCorrelation(source, { mode: 'correlation' }, mapWindow(source, { mode: 'correlation' }))).toThrow(/needs an index/);
  });
});

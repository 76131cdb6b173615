import { describe, expect, it } from 'vitest';
import { mapsReference, referenceSource } from '../../test-fixtures/maps-reference';
import { mapMean } from './map-mean';
import type { MapRequest } from './map-types';
import { mapWindow } from './map-window';

// Reference: xarray means of maps_reference.py (season selection with dt.month.isin, groupby climatology).
const ref = mapsReference();

describe('mapMean()', () => {
  for (const name of ['mean DJF 2000-12..2009-02, box across the antimeridian, lon 180', 'mean anomaly JJA 2001..2008, base 2000..2009']) {
    it(`${name} matches xarray to 1e-9`, () => {
      const c = ref.cases.find((x) => x.name === name)!;
      const { source } = referenceSource(ref, 180, c.request.region);
      const req = c.request as unknown as MapRequest;
      const r = mapMean(source, req, mapWindow(source, req));
      c.values.forEach((v, i) => (v === null ? expect(r.values[i]).toBeNaN() : expect(Math.abs(r.values[i] - v)).toBeLessThan(1e-9)));
    });
  }

  it('warns when no month falls in the selection', () => {
    const { source } = referenceSource(ref, 180);
    const req: MapRequest = { mode: 'mean', period: { from: '2003-05', to: '2003-05' } }; // a month missing everywhere
    expect(mapMean(source, req, mapWindow(source, req)).warnings).toEqual([]);
    const jja: MapRequest = { mode: 'mean', period: { from: '2003-01', to: '2003-02' }, months: 'JJA' };
    expect(mapMean(source, jja, mapWindow(source, jja)).warnings[0]).toMatch(/no month/);
  });
});

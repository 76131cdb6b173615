import { describe, expect, it } from 'vitest';
import { STANDARD_BOXES } from './standard-boxes';

describe('STANDARD_BOXES', () => {
  it('holds the published Niño bounds (NOAA CPC; Trenberth 1997, BAMS 78, 2771–2777)', () => {
    const b = Object.fromEntries(STANDARD_BOXES.map((x) => [x.id, [x.south, x.north, x.west, x.east]]));
    expect(b.nino12).toEqual([-10, 0, -90, -80]);
    expect(b.nino3).toEqual([-5, 5, -150, -90]);
    expect(b.nino34).toEqual([-5, 5, -170, -120]);
    expect(b.nino4).toEqual([-5, 5, 160, -150]);
    expect(b['eq-pacific'].slice(0, 2)).toEqual([-5, 5]);
  });

  it('names a source for every box and keeps ids unique', () => {
    expect(new Set(STANDARD_BOXES.map((x) => x.id)).size).toBe(STANDARD_BOXES.length);
    for (const x of STANDARD_BOXES) expect(x.source.length).toBeGreaterThan(10);
  });
});

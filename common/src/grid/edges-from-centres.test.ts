import { describe, expect, it } from 'vitest';
import { edgesFromCentres } from './edges-from-centres';

describe('edgesFromCentres()', () => {
  it('puts edges midway between centres and half a spacing beyond the ends', () => {
    expect(Array.from(edgesFromCentres([0.5, 1.5, 2.5]))).toEqual([0, 1, 2, 3]);
  });

  it('clamps latitude edges to ±90° when asked (centres −89.5..89.5 → edges −90..90)', () => {
    const centres = Array.from({ length: 180 }, (_, i) => -89.5 + i);
    const e = edgesFromCentres(centres, true);
    expect(e[0]).toBe(-90);
    expect(e[180]).toBe(90);
    expect(Array.from(edgesFromCentres([-89, 0, 89], true))).toEqual([-90, -44.5, 44.5, 90]);
  });

  it('needs at least two centres', () => {
    expect(() => edgesFromCentres([3])).toThrow(RangeError);
  });
});

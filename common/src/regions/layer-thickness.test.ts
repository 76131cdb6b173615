import { describe, expect, it } from 'vitest';
import { layersFromBounds } from './layer-thickness';

describe('layersFromBounds()', () => {
  it('reads lev_bnds in centimeters, positive down, as depths in metres', () => {
    const l = layersFromBounds([0, 1000, 1000, 5000, 5000, 15000], 'centimeters', 'down');
    expect(Array.from(l.top)).toEqual([0, 10, 50]);
    expect(Array.from(l.bottom)).toEqual([10, 50, 150]);
    expect(Array.from(l.thickness)).toEqual([10, 40, 100]);
  });

  it('turns heights (positive up, CF 1.11 §4.3) into depths, whichever bound comes first', () => {
    const l = layersFromBounds([0, -10, -50, -10], 'm', 'up');
    expect(Array.from(l.top)).toEqual([0, 10]);
    expect(Array.from(l.thickness)).toEqual([10, 40]);
  });

  it('accepts the spellings m, metres, cm and refuses a unit that is not a length', () => {
    expect(layersFromBounds([0, 5], 'metres', 'down').thickness[0]).toBe(5);
    expect(layersFromBounds([0, 500], 'cm', 'down').thickness[0]).toBe(5);
    expect(() => layersFromBounds([0, 5], 'dbar', 'down')).toThrow(/"dbar", not a length/);
    expect(() => layersFromBounds([0, 5], undefined, 'down')).toThrow(/not a length/);
  });

  it('refuses odd bounds, empty layers and overlapping layers', () => {
    expect(() => layersFromBounds([0, 5, 10], 'm', 'down')).toThrow(/2 values per layer/);
    expect(() => layersFromBounds([5, 5], 'm', 'down')).toThrow(/no thickness/);
    expect(() => layersFromBounds([0, 10, 5, 20], 'm', 'down')).toThrow(/overlap/);
  });
});

import { describe, expect, it } from 'vitest';
import { regionColumns } from './region-columns';

const grid180 = [-165, -135, -105, -75, -45, -15, 15, 45, 75, 105, 135, 165];
const grid360 = [15, 45, 75, 105, 135, 165, 195, 225, 255, 285, 315, 345];

describe('regionColumns()', () => {
  it('takes a box across the antimeridian eastward from its west edge in both conventions, with the same unwrapped longitudes', () => {
    const a = regionColumns(grid180, [120, -120]);
    const b = regionColumns(grid360, [120, -120]);
    expect(Array.from(a.lon)).toEqual([135, 165, 195, 225]);
    expect(Array.from(b.lon)).toEqual([135, 165, 195, 225]);
    expect(Array.from(a.index)).toEqual([10, 11, 0, 1]);
    expect(Array.from(b.index)).toEqual([4, 5, 6, 7]);
  });

  it('takes a box across 0° on a 0…360 grid', () => {
    expect(Array.from(regionColumns(grid360, [-40, 40]).lon)).toEqual([-15, 15]);
  });

  it('keeps every column in storage order without a range, and for a span of 360°', () => {
    expect(Array.from(regionColumns(grid180).lon)).toEqual(grid180);
    expect(regionColumns(grid180, [0, 360]).index.length).toBe(12);
  });
});

import { describe, expect, it } from 'vitest';
import { regionRows } from './region-rows';

describe('regionRows()', () => {
  it('keeps storage order on a descending axis', () => {
    const r = regionRows([25, 15, 5, -5, -15, -25], [-20, 20]);
    expect(r).toMatchObject({ start: 1, count: 4 });
    expect(Array.from(r.lat)).toEqual([15, 5, -5, -15]);
  });

  it('accepts the range in either order and an ascending axis', () => {
    expect(regionRows([-25, -15, -5, 5], [0, -20])).toMatchObject({ start: 1, count: 2 });
  });

  it('is empty when no centre is inside, and all rows without a range', () => {
    expect(regionRows([10, 20], [30, 40]).count).toBe(0);
    expect(regionRows([10, 20]).count).toBe(2);
  });
});

import { describe, expect, it } from 'vitest';
import { timeMean } from './time-mean';

describe('timeMean()', () => {
  it('averages each cell over its present values (Float32 input, float64 sums)', () => {
    const acc = timeMean(3);
    acc.add(Float32Array.of(1, NaN, 1e7));
    acc.add(Float32Array.of(2, 4, 1e7 + 1));
    const r = acc.finish();
    expect(Array.from(r.values)).toEqual([1.5, 4, 1e7 + 0.5]);
    expect(Array.from(r.count)).toEqual([2, 1, 2]);
  });

  it('skips masked cells and infinities, and honours minCount', () => {
    const acc = timeMean(3, Uint8Array.of(0, 1, 0));
    acc.add([1, 2, Infinity]);
    const r = acc.finish(2);
    expect(Array.from(r.values).map(Number.isNaN)).toEqual([true, true, true]);
    expect(acc.finish().values[0]).toBe(1);
  });

  it('gives NaN everywhere with no slice', () => {
    expect(Number.isNaN(timeMean(1).finish().values[0])).toBe(true);
  });
});

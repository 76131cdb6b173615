import { describe, expect, it } from 'vitest';
import { averageRanks } from './rank';

describe('averageRanks()', () => {
  it('gives ties the mean of the ranks they span (fractional ranking)', () => {
    expect(Array.from(averageRanks([10, 20, 20, 5, 20]))).toEqual([2, 4, 4, 1, 4]);
  });

  it('leaves missing values as NaN and ranks the rest among themselves', () => {
    const r = averageRanks([3, null, 1, NaN]);
    expect(r[0]).toBe(2);
    expect(r[2]).toBe(1);
    expect(r[1]).toBeNaN();
    expect(r[3]).toBeNaN();
  });

  it('handles empty input and one value', () => {
    expect(averageRanks([]).length).toBe(0);
    expect(Array.from(averageRanks([7]))).toEqual([1]);
  });
});

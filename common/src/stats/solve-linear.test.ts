import { describe, expect, it } from 'vitest';
import { solveLinear } from './solve-linear';

describe('solveLinear()', () => {
  it('solves a system that needs pivoting (zero leading entry)', () => {
    const x = solveLinear([0, 2, 1, 1, 1, 1, 2, 1, 3], [5, 6, 13], 3) as Float64Array;
    // Checked by substituting the solution back into A·x.
    const a = [0, 2, 1, 1, 1, 1, 2, 1, 3];
    for (let r = 0; r < 3; r++) {
      expect(a[r * 3] * x[0] + a[r * 3 + 1] * x[1] + a[r * 3 + 2] * x[2]).toBeCloseTo([5, 6, 13][r], 12);
    }
  });

  it('returns null for a singular matrix', () => {
    expect(solveLinear([1, 2, 2, 4], [1, 2], 2)).toBeNull();
    expect(solveLinear([0, 0, 0, 0], [1, 2], 2)).toBeNull();
  });
});

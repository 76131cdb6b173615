import { describe, expect, it } from 'vitest';
import { neumaierSum } from './neumaier-sum';

describe('neumaierSum()', () => {
  it('keeps the small terms that naive summation loses: [1, 1e100, 1, −1e100] sums to 2 (Neumaier 1974 example)', () => {
    const values = [1, 1e100, 1, -1e100];
    expect(values.reduce((a, b) => a + b, 0)).toBe(0);
    expect(neumaierSum(values)).toBe(2);
  });

  it('sums 0.1 ten million times to 1e6 within 1 ulp-scale error (naive loses ~1e-4)', () => {
    const values = new Float64Array(1e7).fill(0.1);
    expect(Math.abs(neumaierSum(values) - 1e6)).toBeLessThan(1e-9);
  });

  it('skips missing values (null, NaN) and gives 0 for empty input', () => {
    expect(neumaierSum([1, null, NaN, 2])).toBe(3);
    expect(neumaierSum([])).toBe(0);
  });
});

import { describe, expect, it } from 'vitest';
import { correlationPValue, correlationT } from './correlation-p-value';

describe('correlationPValue()', () => {
  // Check values computed with SciPy 1.10 (scipy.stats.t.sf): common/test-fixtures/check-values.json, made by test-fixtures/scripts/check_values.py.
  it('gives p = 0.000872 for r = 0.3, N = 120 (t = 3.4162)', () => {
    expect(correlationT(0.3, 120)).toBeCloseTo(3.4162, 4);
    expect(correlationPValue(0.3, 120)).toBeCloseTo(0.000872, 6);
  });

  it('gives p = 0.0531 for r = 0.3, nEff = 42.162 (t = 1.9930)', () => {
    expect(correlationT(0.3, 42.162)).toBeCloseTo(1.993, 3);
    expect(correlationPValue(0.3, 42.162)).toBeCloseTo(0.0531, 4);
  });

  it('gives p = 0.00490 for r = 0.5, n = 30 (t = 3.0551)', () => {
    expect(correlationT(0.5, 30)).toBeCloseTo(3.0551, 4);
    expect(correlationPValue(0.5, 30)).toBeCloseTo(0.0049, 5);
  });

  it('is 1 for r = 0, 0 for |r| = 1, symmetric in the sign of r', () => {
    expect(correlationPValue(0, 50)).toBeCloseTo(1, 14);
    expect(correlationPValue(1, 50)).toBe(0);
    expect(correlationPValue(-0.4, 33)).toBe(correlationPValue(0.4, 33));
  });

  it('is null when r is null or nEff ≤ 2', () => {
    expect(correlationPValue(null, 40)).toBeNull();
    expect(correlationPValue(0.5, 2)).toBeNull();
    expect(correlationT(0.5, 2)).toBeNull();
  });
});

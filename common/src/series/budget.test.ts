import { describe, expect, it } from 'vitest';
import { AnalysisInputError } from './analysis-input-error';
import { budget } from './budget';

describe('budget()', () => {
  it('computes residual = tendency − Σ terms month by month, with terms aligned by calendar month', () => {
    const res = budget({
      tendency: { start: '2000-01', values: [3, 4, 5] },
      terms: { airSea: { start: '2000-01', values: [1, 1, 1] }, transport: { start: '1999-12', values: [9, 1.5, 2, 3.5] } },
    });
    expect(res.sumOfTerms).toEqual({ start: '2000-01', values: [2.5, 3, 4.5] });
    expect(res.residual.values).toEqual([0.5, 1, 0.5]);
    expect(res.rmsResidual).toBeCloseTo(Math.sqrt((0.25 + 1 + 0.25) / 3), 15);
    expect(res.relativeResidual).toBeCloseTo((res.rmsResidual as number) / Math.sqrt((9 + 16 + 25) / 3), 15);
  });

  it('gives a null residual in any month where the tendency or a term is missing or outside its span', () => {
    const res = budget({
      tendency: { start: '2000-01', values: [3, null, 5, 6] },
      terms: { a: { start: '2000-01', values: [1, 1, null] } },
    });
    expect(res.residual.values).toEqual([2, null, null, null]);
    expect(res.sumOfTerms.values).toEqual([1, 1, null, null]);
    // rms(tendency) over the same months as the residual: only January.
    expect(res.relativeResidual).toBeCloseTo(2 / 3, 15);
  });

  it('closes exactly (residual 0) when the terms add up, and reports null sizes when nothing overlaps', () => {
    const exact = budget({ tendency: { start: '2000-01', values: [1, 2] }, terms: { a: { start: '2000-01', values: [1, 2] } } });
    expect(exact.rmsResidual).toBe(0);
    const none = budget({ tendency: { start: '2000-01', values: [1, 2] }, terms: { a: { start: '2010-01', values: [1] } } });
    expect(none.rmsResidual).toBeNull();
    expect(none.relativeResidual).toBeNull();
  });

  it('rejects a budget without terms', () => {
    expect(() => budget({ tendency: { start: '2000-01', values: [1] }, terms: {} })).toThrow(AnalysisInputError);
  });

  it('handles tendencies near 1e300 without overflow in the rms', () => {
    const res = budget({ tendency: { start: '2000-01', values: [1e300, -1e300] }, terms: { a: { start: '2000-01', values: [0, 0] } } });
    expect((res.rmsResidual as number) / 1e300).toBeCloseTo(1, 14);
    expect(res.relativeResidual).toBeCloseTo(1, 14);
  });
});

import { describe, expect, it } from 'vitest';
import { parseMonth } from './month';
import { valuesOnSpan } from './on-span';

describe('valuesOnSpan()', () => {
  it('aligns by calendar month and leaves months outside the series NaN', () => {
    const v = valuesOnSpan({ start: '2000-03', values: [1, null, 3] }, parseMonth('2000-01'), 6);
    expect(Array.from(v)).toEqual([NaN, NaN, 1, NaN, 3, NaN]);
  });

  it('clips a series that starts before the span', () => {
    expect(Array.from(valuesOnSpan({ start: '1999-11', values: [1, 2, 3, 4] }, parseMonth('2000-01'), 2))).toEqual([3, 4]);
  });
});

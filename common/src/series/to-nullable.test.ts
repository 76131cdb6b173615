import { describe, expect, it } from 'vitest';
import { toFloat64 } from './to-float64';
import { toNullable } from './to-nullable';

describe('toFloat64() / toNullable()', () => {
  it('turn every missing value (null, NaN, ±Infinity) into NaN and back into null, never emitting NaN', () => {
    const f = toFloat64([1, null, NaN, Infinity, -2]);
    expect(Array.from(f)).toEqual([1, NaN, NaN, NaN, -2]);
    const out = toNullable(f);
    expect(out).toEqual([1, null, null, null, -2]);
    expect(JSON.stringify(out)).toBe('[1,null,null,null,-2]');
  });
});

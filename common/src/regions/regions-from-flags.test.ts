import { describe, expect, it } from 'vitest';
import { gridsReference } from '../../test-fixtures/grids-reference';
import { regionsFromFlags } from './regions-from-flags';

describe('regionsFromFlags()', () => {
  it('splits the fixture mask by flag_values/flag_meanings (CF 1.11 §3.5) with the cell counts numpy found', () => {
    const ref = gridsReference();
    const regions = regionsFromFlags(ref.grid.codes, [1, 2, 3], 'tropical_pacific northern_band rest_of_ocean');
    for (const r of regions) expect(r.cells, r.name).toBe(ref.regions[r.name].cells);
  });

  it('leaves unlisted codes and NaN in no region', () => {
    const [a, b] = regionsFromFlags([1, 2, 0, Number.NaN, 7, 1], [1, 2], ' a  b ');
    expect(Array.from(a.mask)).toEqual([1, 0, 0, 0, 0, 1]);
    expect(b.cells).toBe(1);
  });

  it('refuses flag attributes that disagree and names an empty region', () => {
    expect(() => regionsFromFlags([1], [1, 2], 'a')).toThrow(/2 codes but flag_meanings names 1/);
    expect(() => regionsFromFlags([1, 1], [1, 2], 'a b')).toThrow(/"b" \(code 2\) has no cell/);
  });
});

import { describe, expect, it } from 'vitest';
import { figureRecipeSchema } from '@upwell/common';
import { canonicalJson, figureCacheKey } from './cache-key';

const id = '6f1d3f0e-3c1a-4c55-9a53-0a4b7b9f4d11';
const parts = (recipe: unknown, version = 1) => ({
  recipe: figureRecipeSchema.parse(recipe),
  series: [{ path: 'series', seriesId: id, version, valuesSha256: 'ab' }],
  eventSet: null,
  zonalField: null,
});

describe('figureCacheKey()', () => {
  it('canonical JSON sorts keys at every level', () => {
    expect(canonicalJson({ b: 1, a: { d: [2, { f: 1, e: 0 }], c: null } })).toBe('{"a":{"c":null,"d":[2,{"e":0,"f":1}]},"b":1}');
  });

  it('gives a spelled-out default and an omitted one the same key', () => {
    const short = { kind: 'seasonal-cycle', series: { seriesId: id } };
    const long = { kind: 'seasonal-cycle', base: { to: '2020-12', from: '1991-01' }, series: { version: 'latest', seriesId: id } };
    expect(figureCacheKey(parts(short))).toBe(figureCacheKey(parts(long)));
  });

  it('changes with the resolved version and with the recipe', () => {
    const r = { kind: 'seasonal-cycle', series: { seriesId: id } };
    expect(figureCacheKey(parts(r, 1))).not.toBe(figureCacheKey(parts(r, 2)));
    expect(figureCacheKey(parts(r))).not.toBe(figureCacheKey(parts({ ...r, base: { from: '1981-01', to: '2010-12' } })));
  });
});

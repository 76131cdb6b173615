import { describe, expect, it } from 'vitest';
import { pinRecipe } from './pin-recipe';

describe('pinRecipe()', () => {
  it('replaces "latest" at each binding path, nested in arrays too, and leaves the input unchanged', () => {
    const recipe = { kind: 'budget', tendency: { seriesId: 'a', version: 'latest' }, terms: [{ name: 'biology', series: { seriesId: 'b', version: 'latest' } }] };
    const pinned = pinRecipe(recipe, [{ path: 'tendency', version: 4 }, { path: 'terms.0.series', version: 2 }]);
    expect(pinned).toEqual({ kind: 'budget', tendency: { seriesId: 'a', version: 4 }, terms: [{ name: 'biology', series: { seriesId: 'b', version: 2 } }] });
    expect(recipe.tendency.version).toBe('latest');
  });

  it('refuses a path that holds no binding rather than writing a version somewhere else', () => {
    expect(() => pinRecipe({ kind: 'x', series: { seriesId: 'a', version: 'latest' } }, [{ path: 'index', version: 1 }])).toThrow('no binding at index');
  });
});

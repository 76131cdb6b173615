import { describe, expect, it } from 'vitest';
import { FigureCache } from './figure-cache';

const result = (kind: string, pad = 0) => JSON.stringify({ kind, data: { pad: 'x'.repeat(pad) } });

describe('FigureCache', () => {
  it('answers a stored key and counts hits and misses', () => {
    const c = new FigureCache({ maxEntries: 10, maxBytes: 1e6 });
    expect(c.get('a')).toBeUndefined();
    c.set('a', result('a'));
    expect(JSON.parse(c.get('a')!).kind).toBe('a');
    expect([c.hits, c.misses]).toEqual([1, 1]);
  });

  it('evicts the least recently used entry beyond maxEntries', () => {
    const c = new FigureCache({ maxEntries: 2, maxBytes: 1e6 });
    c.set('a', result('a'));
    c.set('b', result('b'));
    c.get('a');
    c.set('c', result('c'));
    expect([c.has('a'), c.has('b'), c.has('c')]).toEqual([true, false, true]);
  });

  it('keeps the estimated bytes under maxBytes and skips an entry larger than the whole cache', () => {
    const c = new FigureCache({ maxEntries: 100, maxBytes: 10_000 });
    for (let i = 0; i < 10; i++) c.set(String(i), result(String(i), 1000));
    expect(c.bytes).toBeLessThanOrEqual(10_000);
    expect(c.size).toBeLessThan(10);
    expect(c.has('9')).toBe(true);
    c.set('huge', result('huge', 20_000));
    expect(c.has('huge')).toBe(false);
    c.clear();
    expect([c.size, c.bytes]).toEqual([0, 0]);
  });
});

import { describe, expect, it } from 'vitest';
import { presentFigureJson } from './figures.presenter';

describe('presentFigureJson()', () => {
  it('adds the cached flag to the stored result’s JSON and keeps every other field', () => {
    const stored = { kind: 'scatter', data: { points: [{ x: 1, y: 2 }] }, cacheKey: 'k' };
    expect(JSON.parse(presentFigureJson(JSON.stringify(stored), true))).toEqual({ ...stored, cached: true });
    expect(JSON.parse(presentFigureJson(JSON.stringify(stored), false)).cached).toBe(false);
  });
});

import type { FrozenFigure, FrozenNumber } from '@upwell/common';
import { describe, expect, it } from 'vitest';
import { compareFigures, compareNumbers, diffText } from './snapshot-compare';

const figure = (id: string, ordinal: number, value: number | null, version = 1, caption = 'c'): FrozenFigure => ({
  figureId: id,
  ordinal,
  caption,
  recipe: { kind: 'timeseries', series: { seriesId: 's', version } },
  result: {
    kind: 'timeseries', data: {}, methods: '', cautions: [], warnings: [], engineVersion: '1', cacheKey: 'k', cached: false,
    numbers: [{ key: 'trend', label: 'Trend', units: 'Pg C', value }],
    used: [{ seriesId: 's', name: 'S', version, units: 'Pg C', origin: 'observation', valuesSha256: String(version) }],
    // Only numbers and versions are compared; the data's shape does not matter here.
  } as unknown as FrozenFigure['result'],
  error: null,
});
const number = (ordinal: number, key: string, text: string, value: number | null): FrozenNumber => ({
  ordinal, recipe: { kind: 'timeseries', series: { seriesId: 's', version: 1 } }, key, precision: 2, figureId: null, value, units: 'Pg C', text, error: null,
});

describe('diffText()', () => {
  // jsdiff's word diff keeps the unchanged words and marks the changed ones (worked example).
  it('marks inserted and deleted words and keeps both texts recoverable', () => {
    const runs = diffText('the flux fell sharply', 'the flux rose');
    expect(runs.filter((r) => r.op !== 'insert').map((r) => r.text).join('')).toBe('the flux fell sharply');
    expect(runs.filter((r) => r.op !== 'delete').map((r) => r.text).join('')).toBe('the flux rose');
    expect(runs.find((r) => r.op === 'insert')?.text).toContain('rose');
  });
  it('is all equal for the same text and empty for two empty texts', () => {
    expect(diffText('a b', 'a b')).toEqual([{ op: 'equal', text: 'a b' }]);
    expect(diffText('', '')).toEqual([]);
  });
});

describe('compareFigures()', () => {
  it('matches by figureId: added, removed, unchanged, and changed with its values', () => {
    const rows = compareFigures([figure('a', 1, 1), figure('gone', 2, 3)], [figure('new', 1, 5), figure('a', 2, 2, 2)]);
    expect(rows.map((r) => [r.figureId, r.status, r.ordinalBefore, r.ordinalAfter])).toEqual([
      ['new', 'added', null, 1],
      ['a', 'changed', 1, 2],
      ['gone', 'removed', 2, null],
    ]);
    const a = rows[1];
    expect(a.recipeChanged).toBe(false); // only the version moved
    expect(a.values).toEqual([{ key: 'trend', label: 'Trend', units: 'Pg C', before: 1, after: 2 }]);
    expect(compareFigures([figure('a', 1, 1)], [figure('a', 1, 1)])[0].status).toBe('unchanged');
    expect(compareFigures([figure('a', 1, 1)], [figure('a', 1, 1, 1, 'new caption')])[0].status).toBe('changed');
  });
});

describe('compareNumbers()', () => {
  it('matches by ordinal when it is the same number, else by recipe and key', () => {
    const before = [number(1, 'trend', '1.00', 1), number(2, 'count', '4', 4)];
    const after = [number(1, 'count', '4', 4), number(2, 'trend', '2.00', 2), number(3, 'extra', '0', 0)];
    expect(compareNumbers(before, after).map((r) => [r.key, r.status, r.ordinalBefore, r.ordinalAfter, r.textBefore, r.textAfter])).toEqual([
      ['count', 'unchanged', 2, 1, '4', '4'],
      ['trend', 'changed', 1, 2, '1.00', '2.00'],
      ['extra', 'added', null, 3, null, '0'],
    ]);
    expect(compareNumbers([number(1, 'trend', '1.00', 1)], [])[0].status).toBe('removed');
  });
});

import { describe, expect, it } from 'vitest';
import { partialBottomThickness } from './partial-bottom-thickness';

describe('partialBottomThickness()', () => {
  it('shaves the layer holding the sea floor and dries those below (hand-computed)', () => {
    // layers 0–10, 10–50, 50–150 m; floors at 150 m (full), 30 m (partial), NaN (land)
    const got = partialBottomThickness([0, 10, 50], [10, 50, 150], [150, 30, Number.NaN]);
    expect(Array.from(got)).toEqual([10, 10, 0, 40, 20, 0, 100, 0, 0]);
  });

  it('gives a floor exactly on a layer bound no sliver below it', () => {
    expect(Array.from(partialBottomThickness([0, 10], [10, 50], [10]))).toEqual([10, 0]);
  });
});

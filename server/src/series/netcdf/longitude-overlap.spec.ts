import { describe, expect, it } from 'vitest';
import { longitudeOverlap } from './longitude-overlap';

describe('longitudeOverlap()', () => {
  it('measures the overlap of a cell with a plain box', () => {
    expect(longitudeOverlap(10, 20, 15, 40)).toBe(5);
    expect(longitudeOverlap(10, 20, 0, 40)).toBe(10);
    expect(longitudeOverlap(10, 20, 30, 40)).toBe(0);
  });

  it('handles boxes crossing 0°/360° for cells in either convention', () => {
    expect(longitudeOverlap(355, 356, 350, 10)).toBe(1);
    expect(longitudeOverlap(5, 6, 350, 10)).toBe(1);
    expect(longitudeOverlap(-5, 5, 350, 10)).toBe(10);
    expect(longitudeOverlap(20, 30, 350, 10)).toBe(0);
  });

  it('handles boxes crossing ±180°', () => {
    expect(longitudeOverlap(-180, -170, 170, -170)).toBe(10);
    expect(longitudeOverlap(170, 180, 170, -170)).toBe(10);
    expect(longitudeOverlap(180, 190, 170, -170)).toBe(10);
    expect(longitudeOverlap(-170, -160, 170, -170)).toBe(0);
  });

  it('treats a 360° box as the whole circle', () => {
    expect(longitudeOverlap(-180, -179, 0, 360)).toBe(1);
    expect(longitudeOverlap(359, 360, -180, 180)).toBe(1);
  });
});

import { describe, expect, it } from 'vitest';
import { DEMO_INVENTORY, dicInventories } from './dic-inventory';
import { createRandomStream } from './random-stream';

describe('dicInventories()', () => {
  it('adds tendency/12 each month: a steady 1.2 Pg C/yr adds 0.1 Pg C a month to the 0–100 m layer', () => {
    const inv = dicInventories(createRandomStream(1), new Float64Array(24).fill(1.2));
    expect(inv.upper[0]).toBeCloseTo(DEMO_INVENTORY.upperStart + 0.1, 4);
    expect(inv.upper[23]).toBeCloseTo(DEMO_INVENTORY.upperStart + 2.4, 4);
  });

  it('gives the full depth its slow deep trend with zero upper-layer tendency, within the noise', () => {
    const n = 12 * 40;
    const inv = dicInventories(createRandomStream(1), new Float64Array(n));
    expect(inv.upper.every((v) => v === DEMO_INVENTORY.upperStart)).toBe(true);
    const gain = inv.fullDepth[n - 1] - DEMO_INVENTORY.fullDepthStart;
    expect(gain).toBeCloseTo(DEMO_INVENTORY.deepTrendPerYear * 40, 1);
  });
});

import { describe, expect, it } from 'vitest';
import { runBudgetBench } from './regional-budget';

describe('runBudgetBench() on a small grid (timings are printed, never asserted)', () => {
  it('integrates a field of 1 over the globe to the volume the file describes: Σ areacello × 10 m × levels = 4πR² × 10 m × levels', async () => {
    const f = await runBudgetBench({ months: 2, levels: 3, ny: 18, nx: 36, withoutXarray: true });
    const sphere = 4 * Math.PI * 6371000 ** 2;
    expect(f.check.integral / (sphere * 30)).toBeCloseTo(1, 10);
    expect(f.check.volume / (sphere * 30)).toBeCloseTo(1, 10);
    expect(f.values).toBe(5 * 2 * 3 * 18 * 36);
  });
});

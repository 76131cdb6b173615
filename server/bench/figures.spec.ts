import { describe, expect, it } from 'vitest';
import { runFiguresBench } from './figures';

describe('runFiguresBench() with a few calls (timings are printed, never asserted)', () => {
  it('times every recipe kind, cold and cached, and every repeat is served from the cache', async () => {
    const rows = await runFiguresBench({ iterations: 2, months: 120 });
    expect(rows.map((r) => r.kind).sort()).toEqual(['budget', 'composite', 'event-table', 'hovmoller', 'lag-correlation', 'scatter', 'seasonal-cycle', 'timeseries']);
    for (const r of rows) {
      expect(r.allCached, r.kind).toBe(true);
      expect(Number.isFinite(r.coldP95) && Number.isFinite(r.cachedP95), r.kind).toBe(true);
    }
  });
});

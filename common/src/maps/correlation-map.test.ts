import { describe, expect, it } from 'vitest';
import { lagCorrelation } from '../stats/lag-correlation';
import { mulberry32, normalVariate } from '../stats/prng';
import { correlationMap } from './correlation-map';

// Check: each cell must give what the series engine's lagCorrelation (the series rule for r, n, nEff by
// Bretherton et al. 1999, and p) gives for that cell's series at lag 0 — including gaps. The numpy reference
// for whole maps is in compute-map.test.ts.
describe('correlationMap()', () => {
  const rng = mulberry32(3);
  const months = 60;
  const index: number[] = [];
  const cells = [[], [], [], []] as (number | null)[][];
  let a = 0;
  for (let t = 0; t < months; t++) {
    a = 0.7 * a + normalVariate(rng);
    index.push(a + 1e3);
    cells[0].push(0.5 * a + normalVariate(rng));
    cells[1].push(t % 7 === 3 ? null : -a + 0.3 * normalVariate(rng));
    cells[2].push(1e4 + 0.001 * normalVariate(rng));
    cells[3].push(t < 58 ? null : 1);
  }

  it('gives the series engine’s r, n, nEff and p per cell, gaps included (1e-12)', () => {
    const acc = correlationMap(4, 1e3);
    for (let t = 0; t < months; t++) acc.add(cells.map((c) => c[t] ?? NaN), index[t], 100 + t);
    const map = acc.finish();
    for (let c = 0; c < 3; c++) {
      const row = lagCorrelation({ x: { start: '2000-01', values: index }, y: { start: '2000-01', values: cells[c] }, maxLag: 0 }).lags[0];
      expect(map.n[c]).toBe(row.n);
      expect(map.r[c]).toBeCloseTo(row.r!, 12);
      expect(map.nEff[c]).toBeCloseTo(row.nEff!, 10);
      expect(map.p[c]).toBeCloseTo(row.p!, 12);
    }
    expect(Number.isNaN(map.r[3])).toBe(true);
    expect(map.n[3]).toBe(2);
  });

  it('gives the least-squares slope in field units per index unit (y = 3x + 2 exactly)', () => {
    const acc = correlationMap(1);
    [1, 4, 2, 8, 5].forEach((x, t) => acc.add([3 * x + 2], x, t));
    expect(acc.finish().slope[0]).toBeCloseTo(3, 12);
  });

  it('treats a skipped month as a break of the lag-1 neighbourhood', () => {
    const a1 = correlationMap(1);
    const a2 = correlationMap(1);
    const x = [1, 3, 2, 5, 4, 6];
    const y = [2, 1, 4, 3, 6, 5];
    x.forEach((v, t) => a1.add([y[t]], v, t));
    x.forEach((v, t) => a2.add([y[t]], v, t < 3 ? t : t + 1));
    expect(a1.finish().r[0]).toBeCloseTo(a2.finish().r[0], 14);
    expect(a1.finish().nEff[0]).not.toBeCloseTo(a2.finish().nEff[0], 6);
  });
});

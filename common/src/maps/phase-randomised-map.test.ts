import { describe, expect, it } from 'vitest';
import { ebisuzakiSurrogate, ebisuzakiTest } from '../stats/ebisuzaki';
import { pearson } from '../stats/pearson';
import { mulberry32, normalVariate } from '../stats/prng';
import { phaseRandomisedMap } from './phase-randomised-map';

// Check: per cell, the series engine's Ebisuzaki (1997) test with the same seed and surrogate count.
describe('phaseRandomisedMap()', () => {
  it('gives each complete cell the p of ebisuzakiTest on its series, and NaN to an incomplete one', () => {
    const rng = mulberry32(11);
    const n = 48;
    const x = Array.from({ length: n }, () => normalVariate(rng));
    const ys = [x.map((v) => v + 2 * normalVariate(rng)), x.map(() => normalVariate(rng)), x.map((v, t) => (t === 5 ? NaN : v))];
    const seeded = mulberry32(5);
    const surrogates = Array.from({ length: 300 }, () => ebisuzakiSurrogate(x, seeded));
    const acc = phaseRandomisedMap(3, surrogates);
    for (let t = 0; t < n; t++) acc.add(ys.map((y) => y[t]), t);
    const r = ys.map((y) => pearson(x, y) ?? NaN);
    const p = acc.finish(r);
    for (let c = 0; c < 2; c++) expect(p[c]).toBe(ebisuzakiTest(x, ys[c], mulberry32(5), 300).p);
    expect(Number.isNaN(p[2])).toBe(true);
  });
});

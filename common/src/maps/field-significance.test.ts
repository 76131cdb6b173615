import { describe, expect, it } from 'vitest';
import { mapsReference } from '../../test-fixtures/maps-reference';
import { fieldSignificance } from './field-significance';

// Wilks (2016), BAMS 97:2263–2273: α_FDR = 2·α_global. Counts checked against statsmodels fdr_bh (fixture fdrDemo).
const { fdrDemo } = mapsReference();

describe('fieldSignificance()', () => {
  it('controls the FDR at 2α and counts pointwise passes at α, as statsmodels fdr_bh at alpha = 2α', () => {
    const s = fieldSignificance(fdrDemo.p.map((v) => (v === null ? NaN : v)), fdrDemo.alpha);
    expect(s.alphaFdr).toBe(0.1);
    expect(s.pointwise).toBe(fdrDemo.pointwise);
    expect(s.fdr).toBe(fdrDemo.fdr);
    expect(s.tested).toBe(fdrDemo.tested);
  });

  it('caps α_FDR at 1', () => {
    expect(fieldSignificance([0.2], 0.6).alphaFdr).toBe(1);
  });
});

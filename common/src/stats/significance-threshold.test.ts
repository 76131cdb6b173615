import { describe, expect, it } from 'vitest';
import tQuantile from '@stdlib/stats-base-dists-t-quantile';
import { correlationPValue } from './correlation-p-value';
import { significanceThreshold } from './significance-threshold';

describe('significanceThreshold()', () => {
  it('is the |r| where the p-value equals alpha', () => {
    for (const nEff of [5, 42.1622, 120, 3000]) {
      for (const alpha of [0.01, 0.05, 0.1]) {
        const r = significanceThreshold(nEff, alpha) as number;
        expect(correlationPValue(r, nEff)).toBeCloseTo(alpha, 12);
      }
    }
  });

  it('matches r = t/√(ν + t²) with the @stdlib t quantile (ν = 28, α = 0.05 → 0.3610)', () => {
    const t = tQuantile(0.975, 28);
    expect(significanceThreshold(30, 0.05)).toBeCloseTo(t / Math.sqrt(28 + t * t), 12);
    expect(significanceThreshold(30, 0.05)).toBeCloseTo(0.361, 3);
  });

  it('is null for nEff ≤ 2 or alpha outside (0, 1)', () => {
    expect(significanceThreshold(2, 0.05)).toBeNull();
    expect(significanceThreshold(30, 0)).toBeNull();
    expect(significanceThreshold(30, 1)).toBeNull();
  });
});

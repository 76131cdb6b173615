import { describe, expect, it } from 'vitest';
import { createRandomStream, DEMO_SEED } from './random-stream';
import { DEMO_OSCILLATOR, runRechargeOscillator } from './recharge-oscillator';

/** Autocorrelation at lags 0..maxLag (biased estimator, Box & Jenkins; common practice). */
function autocorrelation(x: Float64Array, maxLag: number): number[] {
  const n = x.length;
  const m = x.reduce((a, b) => a + b, 0) / n;
  const c0 = x.reduce((a, b) => a + (b - m) ** 2, 0);
  return Array.from({ length: maxLag + 1 }, (_, k) => {
    let s = 0;
    for (let i = k; i < n; i++) s += (x[i] - m) * (x[i - k] - m);
    return s / c0;
  });
}

describe('runRechargeOscillator()', () => {
  const long = runRechargeOscillator(createRandomStream(DEMO_SEED), 12 * 300).sst;

  it('oscillates with a period inside the ENSO band of 2–7 years (common practice): twice the lag of the first autocorrelation minimum', () => {
    const acf = autocorrelation(long, 60);
    let lag = 1;
    while (lag < 60 && !(acf[lag] < acf[lag - 1] && acf[lag] <= acf[lag + 1])) lag++;
    expect(acf[lag]).toBeLessThan(0);
    expect(2 * lag).toBeGreaterThanOrEqual(24);
    expect(2 * lag).toBeLessThanOrEqual(84);
  });

  it('matches the linear period 2π/√(F1·F2 − ((R0+ε)/2)²) of its parameters within the 2–7-year band (Jin 1997 eigenvalues)', () => {
    const p = DEMO_OSCILLATOR;
    const omega = Math.sqrt(p.thermoclineFeedback * p.rechargeCoupling - ((p.growthMean + p.thermoclineDamping) / 2) ** 2);
    const years = (2 * Math.PI) / omega / 12;
    expect(years).toBeGreaterThan(3);
    expect(years).toBeLessThan(5);
    expect((p.growthMean - p.thermoclineDamping) / 2).toBeLessThan(0); // damped: noise keeps it going
  });

  it('has an anomaly sd of about 0.7–1.1 °C and positive skewness, warm events the stronger (observed ENSO asymmetry, An & Jin 2004, from memory)', () => {
    const m = long.reduce((a, b) => a + b, 0) / long.length;
    const sd = Math.sqrt(long.reduce((a, b) => a + (b - m) ** 2, 0) / long.length);
    expect(sd).toBeGreaterThan(0.7);
    expect(sd).toBeLessThan(1.1);
    const skew = long.reduce((a, b) => a + ((b - m) / sd) ** 3, 0) / long.length;
    expect(skew).toBeGreaterThan(0);
  });

  it('locks to the season: |T| is larger in November–January than in March–May (boreal-winter peaks, common practice)', () => {
    const byMonth = new Array(12).fill(0);
    long.forEach((t, i) => (byMonth[i % 12] += t * t));
    const winter = byMonth[10] + byMonth[11] + byMonth[0];
    const spring = byMonth[2] + byMonth[3] + byMonth[4];
    expect(winter).toBeGreaterThan(1.2 * spring);
  });

  it('gives the same run for the same seed, and stays at rest without noise', () => {
    const a = runRechargeOscillator(createRandomStream(5), 24);
    expect(a).toEqual(runRechargeOscillator(createRandomStream(5), 24));
    const quiet = runRechargeOscillator(createRandomStream(5), 24, { ...DEMO_OSCILLATOR, noiseT: 0, noiseH: 0 });
    expect(Array.from(quiet.sst).every((t) => t === 0)).toBe(true);
  });
});

import { describe, expect, it } from 'vitest';
import { describeAnomaly, describeRule, describeVersions, methodsSentence, NEFF_FORM } from './methods';

const base = { base: { from: '1991-01', to: '2020-12' }, method: 'monthly-mean' as const, standardize: false, detrend: false, smooth: 1 };

describe('methods sentence builder', () => {
  it('names the base period and the WMO-No. 1203 rule for a monthly-mean climatology', () => {
    expect(describeAnomaly(base)).toBe(
      'anomalies against the 1991-01 to 2020-12 monthly-mean climatology (a calendar month needs values in 80% of base-period years, WMO-No. 1203)',
    );
  });

  it('lists detrending, standardizing and smoothing in the order the engine applies them', () => {
    const text = describeAnomaly({ ...base, detrend: true, standardize: true, smooth: 5 });
    expect(text.indexOf('detrended')).toBeLessThan(text.indexOf('standardized'));
    expect(text.indexOf('standardized')).toBeLessThan(text.indexOf('5-month centred running mean'));
  });

  it('leaves out steps the caller skips (the index of an event rule is smoothed by the rule instead)', () => {
    expect(describeAnomaly({ ...base, smooth: 5 }, { skip: ['smooth'] })).not.toContain('running mean');
  });

  it('states the event rule with its threshold, minimum duration, smoothing, rounding and CPC source', () => {
    expect(describeRule({ threshold: 0.5, minDuration: 5, smooth: 3, roundTo: 1 })).toBe(
      'events where the 3-month running mean of the index anomaly stays at or above +0.5 (warm) or at or below −0.5 (cold) ' +
        "for at least 5 consecutive months, compared after rounding to 1 decimal (the operational 3-month-index rule of the US Climate Prediction Center's ONI)",
    );
  });

  it('names each version once, as "name vN"', () => {
    const a = { seriesId: 'a', name: 'DIC 0–100 m', version: 2 };
    const b = { seriesId: 'b', name: 'Niño-like index', version: 1 };
    expect(describeVersions([a, b, a])).toBe('DIC 0–100 m v2, Niño-like index v1');
  });

  it('makes one capitalised sentence ending in a full stop, closing with the versions', () => {
    const s = methodsSentence(['lagged correlation', NEFF_FORM], [{ seriesId: 'a', name: 'DIC 0–100 m', version: 2 }]);
    expect(s).toBe('Lagged correlation; nEff = n(1 − r1x r1y)/(1 + r1x r1y), Bretherton et al. 1999; computed from DIC 0–100 m v2.');
  });
});

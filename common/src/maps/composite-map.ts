import { oneSampleTTest } from '../stats/one-sample-t-test';
import { welchTTest } from '../stats/welch-t-test';

/** A per-cell event composite being built from anomaly slices. */
export interface CompositeMapAccumulator {
  /** An anomaly slice of a month inside an event's chosen window. */
  addEvent(anomaly: ArrayLike<number>): void;
  /** An anomaly slice of a neutral month (no event of either phase). */
  addNeutral(anomaly: ArrayLike<number>): void;
  finish(baseline: 'none' | 'neutral'): CompositeMap;
}

/** Composite per cell: NaN where undefined. */
export interface CompositeMap {
  /** Event-month mean anomaly, minus the neutral-month mean when the baseline is 'neutral'. */
  values: Float64Array;
  t: Float64Array;
  dof: Float64Array;
  p: Float64Array;
  nEvent: Uint16Array;
  nNeutral: Uint16Array;
}

/**
 * Event composite map fed one anomaly slice at a time. Each cell keeps a Welford (1962, Technometrics
 * 4:419–420) count, mean and M2 for event months and for neutral months. With baseline 'neutral'
 * the map is the difference of the two means, tested by Welch's t (welchTTest); with 'none' it is
 * the event mean, tested against zero by a one-sample t. Months are the samples, so serial
 * correlation within an event makes p optimistic (callers say so). Missing: non-finite values.
 */
export function compositeMap(cells: number): CompositeMapAccumulator {
  // Each group in its own arrays, so a neutral month touches only the neutral state (memory traffic, not flops, bounds this loop).
  const eventMean = new Float64Array(cells);
  const eventM2 = new Float64Array(cells);
  const neutralMean = new Float64Array(cells);
  const neutralM2 = new Float64Array(cells);
  const nEvent = new Uint16Array(cells);
  const nNeutral = new Uint16Array(cells);
  const update = (anomaly: ArrayLike<number>, counts: Uint16Array, mean: Float64Array, m2: Float64Array) => {
    for (let c = 0; c < cells; c++) {
      const v = anomaly[c];
      if (v - v !== 0) continue;
      const k = ++counts[c];
      const d = v - mean[c];
      const next = mean[c] + d / k;
      mean[c] = next;
      m2[c] += d * (v - next);
    }
  };
  return {
    addEvent: (a) => update(a, nEvent, eventMean, eventM2),
    addNeutral: (a) => update(a, nNeutral, neutralMean, neutralM2),
    finish(baseline) {
      const out: CompositeMap = { values: new Float64Array(cells).fill(NaN), t: new Float64Array(cells).fill(NaN), dof: new Float64Array(cells).fill(NaN), p: new Float64Array(cells).fill(NaN), nEvent, nNeutral };
      for (let c = 0; c < cells; c++) {
        const me = eventMean[c], m2e = eventM2[c], mn = neutralMean[c], m2n = neutralM2[c];
        if (nEvent[c] === 0 || (baseline === 'neutral' && nNeutral[c] === 0)) continue;
        out.values[c] = baseline === 'neutral' ? me - mn : me;
        const test = baseline === 'neutral' ? welchTTest(nEvent[c], me, m2e, nNeutral[c], mn, m2n) : oneSampleTTest(nEvent[c], me, m2e);
        if (test.t !== null) {
          out.t[c] = test.t;
          out.dof[c] = test.dof!;
          out.p[c] = test.p!;
        }
      }
      return out;
    },
  };
}

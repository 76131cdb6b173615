import { AnalysisInputError } from '../series/analysis-input-error';
import { parseMonth } from '../series/month';
import { toFloat64 } from '../series/to-float64';
import { toNullable } from '../series/to-nullable';
import type { MonthlySeries } from '../series/types';
import { studentTQuantile } from '../stats/student-t';

/** Body of POST /api/analysis/composite: a series, the event months, and the window around them. */
export interface CompositeInput {
  series: MonthlySeries;
  events: { at: string }[];
  before: number;
  after: number;
  confidence?: number;
}

/** Composite (superposed epoch) of the series around the events, per offset in months. */
export interface CompositeOutput {
  offsets: number[];
  mean: (number | null)[];
  lower: (number | null)[];
  upper: (number | null)[];
  n: number[];
  members: (number | null)[][];
}

/**
 * Superposed-epoch composite: for each event month and offset −before..+after, the series value
 * there (null outside the series or missing); per offset the mean over present members, their
 * count n, and the interval mean ± t((1+confidence)/2, n−1)·s/√n with s the sample sd (n − 1) —
 * null where n < 2. Event months must be strictly increasing (sorted, no duplicates): anything else
 * is an AnalysisInputError, since a duplicate would silently weigh one event twice.
 */
export function composite(req: CompositeInput): CompositeOutput {
  const conf = req.confidence ?? 0.95;
  const start = parseMonth(req.series.start);
  const x = toFloat64(req.series.values);
  const at = req.events.map((e) => parseMonth(e.at));
  for (let i = 1; i < at.length; i++) {
    if (at[i] <= at[i - 1]) {
      throw new AnalysisInputError(
        `event dates must be strictly increasing: ${req.events[i].at} follows ${req.events[i - 1].at}${at[i] === at[i - 1] ? ' (duplicate)' : ''}`,
      );
    }
  }
  const width = req.before + req.after + 1;
  const offsets = Array.from({ length: width }, (_, j) => j - req.before);
  const members = at.map((a) => {
    const row = new Float64Array(width);
    for (let j = 0; j < width; j++) {
      const i = a + offsets[j] - start;
      row[j] = i >= 0 && i < x.length ? x[i] : NaN;
    }
    return row;
  });
  const mean = new Float64Array(width).fill(NaN);
  const lower = new Float64Array(width).fill(NaN);
  const upper = new Float64Array(width).fill(NaN);
  const n = new Array<number>(width).fill(0);
  for (let j = 0; j < width; j++) {
    // Welford (1962) over the members present at this offset.
    let m = 0;
    let m2 = 0;
    let k = 0;
    for (const row of members) {
      const v = row[j];
      if (v !== v) continue;
      const d = v - m;
      m += d / ++k;
      m2 += d * (v - m);
    }
    n[j] = k;
    if (k === 0) continue;
    mean[j] = m;
    if (k < 2) continue;
    const half = (studentTQuantile((1 + conf) / 2, k - 1) * Math.sqrt(m2 / (k - 1))) / Math.sqrt(k);
    lower[j] = m - half;
    upper[j] = m + half;
  }
  return { offsets, mean: toNullable(mean), lower: toNullable(lower), upper: toNullable(upper), n, members: members.map(toNullable) };
}

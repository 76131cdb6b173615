import { formatMonth, parseMonth } from '../series/month';
import { runningMean } from '../series/running-mean';
import { toFloat64 } from '../series/to-float64';
import type { MonthlySeries } from '../series/types';
import { roundHalfAway } from './round-half-away';
import { eventStrength, sustainedStrength, type EventStrength } from './strength';

/** Body of POST /api/analysis/events. */
export interface EventsInput {
  index: MonthlySeries;
  threshold?: number;
  minDuration?: number;
  smooth?: number;
  roundTo?: number;
  /**
   * How strength is classed: "peak" (default; the peak |value|, eventStrength) or "sustained" (the class
   * threshold met in ≥ 3 consecutive overlapping seasons, on rounded values when roundTo is set; sustainedStrength).
   */
  strengthRule?: 'peak' | 'sustained';
}

/** One warm or cold event. start, end and peak are months "YYYY-MM"; months is the run length. */
export interface EnsoEvent {
  phase: 'warm' | 'cold';
  start: string;
  end: string;
  peak: string;
  peakValue: number;
  months: number;
  strength: EventStrength;
}

/** Result of detectEvents(), in time order. */
export interface EventsOutput {
  events: EnsoEvent[];
}

/**
 * Warm and cold events in an index by the NOAA CPC Oceanic Niño Index rule: after optional
 * smoothing (centred running mean of `smooth` months, default 1 = none), an event is a maximal run
 * of at least `minDuration` (default 5) consecutive months at or above +threshold (warm) or at or
 * below −threshold (cold), threshold default 0.5. A missing month breaks a run. With `roundTo` = d
 * the values are compared after rounding to d decimals (roundHalfAway), as CPC's published table
 * is; the peak (largest |value|, first on ties, judged on unrounded values) reports the unrounded
 * smoothed value. strength follows eventStrength (common practice).
 */
export function detectEvents(req: EventsInput): EventsOutput {
  const threshold = req.threshold ?? 0.5;
  const minDuration = req.minDuration ?? 5;
  const start = parseMonth(req.index.start);
  const x = runningMean(toFloat64(req.index.values), req.smooth ?? 1);
  const events: EnsoEvent[] = [];
  let runStart = -1;
  let runPhase = 0;
  for (let i = 0; i <= x.length; i++) {
    const v = i < x.length ? x[i] : NaN;
    const c = v === v && req.roundTo !== undefined ? roundHalfAway(v, req.roundTo) : v;
    const phase = c >= threshold ? 1 : c <= -threshold ? -1 : 0;
    if (phase === runPhase && phase !== 0) continue;
    if (runPhase !== 0 && i - runStart >= minDuration) events.push(makeEvent(x, start, runStart, i - 1, runPhase, req));
    runPhase = phase;
    runStart = i;
  }
  return { events };
}

/** Builds the event for the run x[from..to] of the given phase (+1 warm, −1 cold). */
function makeEvent(x: Float64Array, start: number, from: number, to: number, phase: number, req: EventsInput): EnsoEvent {
  let peak = from;
  for (let i = from + 1; i <= to; i++) if (Math.abs(x[i]) > Math.abs(x[peak])) peak = i;
  return {
    phase: phase > 0 ? 'warm' : 'cold',
    start: formatMonth(start + from),
    end: formatMonth(start + to),
    peak: formatMonth(start + peak),
    peakValue: x[peak],
    months: to - from + 1,
    strength:
      req.strengthRule === 'sustained'
        ? sustainedStrength(x.subarray(from, to + 1), phase > 0 ? 1 : -1, { roundTo: req.roundTo })
        : eventStrength(Math.abs(x[peak])),
  };
}

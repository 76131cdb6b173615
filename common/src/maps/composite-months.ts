import { parseMonth } from '../series/month';

/** An event of a saved set, as the maps engine needs it (months "YYYY-MM"). */
export interface MapEvent {
  phase: 'warm' | 'cold';
  start: string;
  peak: string;
  end: string;
}

/** Which months enter an event composite, and which count as neutral. */
export interface CompositeMonths {
  /** Months (since 0000-01) at the chosen offsets from the peaks of the chosen phase's events; each once. */
  event: Set<number>;
  /** Whether a month is neutral: inside no event of either phase (start to end). */
  isNeutral: (month: number) => boolean;
  events: number;
}

/**
 * The months of an event composite: for each event of `phase`, its peak month plus each offset
 * (e.g. −1, 0, +1 for the peak ± 1 month). A month in two events' windows counts once. Neutral
 * months are those outside every event of either phase, so the other phase does not bias the
 * baseline (common practice for warm-minus-neutral composites).
 */
export function compositeMonths(events: readonly MapEvent[], phase: 'warm' | 'cold', offsets: readonly number[]): CompositeMonths {
  const event = new Set<number>();
  let count = 0;
  const spans: [number, number][] = [];
  for (const e of events) {
    spans.push([parseMonth(e.start), parseMonth(e.end)]);
    if (e.phase !== phase) continue;
    count++;
    const peak = parseMonth(e.peak);
    for (const k of offsets) event.add(peak + k);
  }
  return { event, isNeutral: (m) => !spans.some(([a, b]) => m >= a && m <= b), events: count };
}

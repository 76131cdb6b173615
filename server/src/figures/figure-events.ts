import {
  describeAnomaly,
  describeEventSet,
  describeRule,
  detectEvents,
  eventStrength,
  parseMonth,
  type EventsInput,
  type FigureEvent,
  type ParsedAnomalyOptions,
  type ParsedEventSource,
  type RuleOpts,
} from '@upwell/common';
import { seriesAnomaly } from './figure-anomaly';
import type { LoadedEventSet, LoadedSeries } from './loaded-inputs';

/** Events for a figure, with the clause that says where they came from. */
export interface ResolvedEvents {
  events: FigureEvent[];
  clause: string;
  warnings: string[];
}

/**
 * Events by the operational rule: engine `detectEvents` on the index anomaly (the recipe's base
 * period, climatology, detrend and standardize), smoothed by the rule's running mean in place of
 * the anomaly's own smoothing so that the index is not smoothed twice.
 */
export function eventsByRule(index: LoadedSeries, a: ParsedAnomalyOptions, rule: RuleOpts): ResolvedEvents {
  const anom = seriesAnomaly(index, a, ['smooth']);
  // The rule's options are the engine's, field for field (one definition: the schema's rule).
  const { threshold, minDuration, smooth, roundTo } = rule;
  const { events } = detectEvents({ index: { start: anom.start, values: anom.values }, threshold, minDuration, smooth, roundTo } satisfies EventsInput);
  return {
    events: events.map((e) => ({ ...e, label: '' })),
    clause: `${describeRule(rule)}, on ${index.name} ${describeAnomaly(a, { skip: ['smooth'] })}`,
    warnings: anom.warnings,
  };
}

/**
 * Events of a saved set. Their peak value is read off the index anomaly (the recipe's options, its
 * smoothing included) at the set's peak month, since a set records months, not values; null where
 * the index has no value there.
 */
export function eventsFromSet(set: LoadedEventSet, index: LoadedSeries, a: ParsedAnomalyOptions): ResolvedEvents {
  const anom = seriesAnomaly(index, a);
  const first = parseMonth(anom.start);
  const events = set.events.map((e): FigureEvent => {
    const v = anom.values[parseMonth(e.peak) - first];
    const peakValue = v === undefined || v === null ? null : v;
    return {
      phase: e.phase,
      start: e.start,
      peak: e.peak,
      end: e.end,
      months: parseMonth(e.end) - parseMonth(e.start) + 1,
      peakValue,
      strength: peakValue === null ? null : eventStrength(Math.abs(peakValue)),
      label: e.label,
    };
  });
  return {
    events,
    clause: `${describeEventSet(set)}, peak values from ${index.name} ${describeAnomaly(a)}`,
    warnings: anom.warnings,
  };
}

/** Events by a recipe's source: the rule on the index, or the notebook's saved set (already loaded). */
export function resolveEvents(source: ParsedEventSource, index: LoadedSeries, a: ParsedAnomalyOptions, set: LoadedEventSet | null): ResolvedEvents {
  if (source.from === 'rule') return eventsByRule(index, a, source);
  // The service loads the set whenever a recipe names one; missing here would be a bug.
  if (!set) throw new Error('event set was not loaded');
  return eventsFromSet(set, index, a);
}

/**
 * Composite recipe: the series anomaly around the peak of each event of one phase (superposed
 * epoch, engine `composite`), with the mean, its t-interval and every member.
 *
 * data: CompositeData (common/src/figure-kinds/composite) — `events` (the members' events), `offsets` [{ offset, mean, lower, upper, n }],
 * `members` [{ event (peak month), offset, value }] for one line per event.
 *
 * numbers:
 * - `peak.mean` — the composite mean of largest |mean|, series (anomaly) units
 * - `peak.offset` — its offset from the event peaks, months (positive: after)
 * - `events.count` — number of events composited
 */
import { composite, compositeMethods, CAUSATION_CAUTION } from '@upwell/common';
import { seriesAnomaly } from '../figure-anomaly';
import { resolveEvents } from '../figure-events';
import { seriesAt } from '../series-input';
import { bindingAt, type FigureRecipeHandler } from './recipe';

/** The composite recipe. */
export const compositeRecipe: FigureRecipeHandler<'composite'> = {
  kind: 'composite',
  bindings: (r) => [bindingAt('index', r.index), bindingAt('series', r.series)],
  compute(r, inputs) {
    const index = seriesAt(inputs, 'index');
    const series = seriesAt(inputs, 'series');
    const ev = resolveEvents(r.events, index, r.anomaly, inputs.eventSet);
    const events = ev.events.filter((e) => e.phase === r.phase);
    const anom = seriesAnomaly(series, r.anomaly);
    const c = composite({ series: anom, events: events.map((e) => ({ at: e.peak })), before: r.before, after: r.after, confidence: r.confidence });
    const offsets = c.offsets.map((offset, j) => ({ offset, mean: c.mean[j], lower: c.lower[j], upper: c.upper[j], n: c.n[j] }));
    const members = c.members.flatMap((row, i) => row.map((value, j) => ({ event: events[i].peak, offset: c.offsets[j], value })));
    const peak = offsets.reduce<(typeof offsets)[number] | null>((a, b) => (b.mean !== null && (a === null || Math.abs(b.mean) > Math.abs(a.mean!)) ? b : a), null);
    const units = r.anomaly.standardize ? 'standard deviations' : series.units;
    const warnings = [...anom.warnings, ...ev.warnings.filter((w) => !anom.warnings.includes(w))];
    if (events.length === 0) warnings.push(`no ${r.phase} events to composite`);
    return {
      data: { phase: r.phase, units, confidence: r.confidence, events, offsets, members },
      numbers: [
        { key: 'peak.mean', label: `Largest composite ${series.name} anomaly around ${r.phase} events`, value: peak?.mean ?? null, units },
        { key: 'peak.offset', label: 'Months from the event peak to the largest composite anomaly', value: peak?.offset ?? null, units: 'months' },
        { key: 'events.count', label: `Number of ${r.phase} events composited`, value: events.length, units: 'events' },
      ],
      methods: compositeMethods(r, index, series, ev.clause),
      cautions: [CAUSATION_CAUTION],
      warnings,
    };
  },
};

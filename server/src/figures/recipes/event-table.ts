/**
 * Event-table recipe: each event of the index, and for each bound carbon series the carbon change
 * over the event in Pg C — the integral of the rate's anomaly over the event's months, or the
 * inventory anomaly's change from start to end (see carbon-change.ts). Carbon anomalies use the
 * recipe's base period, climatology and detrend, but are neither standardized (they keep their
 * units) nor smoothed (the months are summed as measured).
 *
 * data: EventTableData (common/src/figure-kinds/event-table) — `carbonSeries` [{ seriesId, name, units, treatment }], `rows` [FigureEvent &
 * { carbon: { [seriesId]: Pg C | null } }].
 *
 * numbers:
 * - `events.count`, `events.warm.count`, `events.cold.count`
 * - per event (by its peak month) and carbon series: `event.<peak YYYY-MM>.<seriesId>.PgC` (Pg C)
 * - per event: `event.<peak YYYY-MM>.peakValue` (index units)
 * - the event of largest |peakValue|: `strongest.peakValue` (index units; its label names the
 *   peak month), `strongest.months`, and per carbon series `strongest.<seriesId>.PgC` (Pg C)
 */
import { seriesAnomaly } from '../figure-anomaly';
import { resolveEvents } from '../figure-events';
import { seriesAt } from '../series-input';
import { carbonChange, planCarbonChange } from '../carbon-change';
import { eventTableMethods, type FigureNumber } from '@upwell/common';
import { bindingAt, type FigureRecipeHandler } from './recipe';

/** The event-table recipe. */
export const eventTableRecipe: FigureRecipeHandler<'event-table'> = {
  kind: 'event-table',
  bindings: (r) => [bindingAt('index', r.index), ...r.carbon.map((b, i) => bindingAt(`carbon.${i}`, b))],
  compute(r, inputs) {
    const index = seriesAt(inputs, 'index');
    const carbon = r.carbon.map((_, i) => seriesAt(inputs, `carbon.${i}`));
    const ev = resolveEvents(r.events, index, r.anomaly, inputs.eventSet);
    const warnings = [...ev.warnings];
    const plans = carbon.map((c) => ({ c, plan: planCarbonChange(c.units), anom: seriesAnomaly(c, r.anomaly, ['standardize', 'smooth']) }));
    for (const p of plans) warnings.push(...p.anom.warnings.filter((w) => !warnings.includes(w)));
    const rows = ev.events.map((e) => {
      const cells: Record<string, number | null> = {};
      for (const { c, plan, anom } of plans) {
        const change = carbonChange(anom, c.units, plan, e);
        cells[c.seriesId] = change.value;
        if (change.warning) warnings.push(`${c.name}, event peaking ${e.peak}: ${change.warning}`);
      }
      return { ...e, carbon: cells };
    });
    const numbers: FigureNumber[] = [
      { key: 'events.count', label: 'Number of events', value: rows.length, units: 'events' },
      { key: 'events.warm.count', label: 'Number of warm events', value: rows.filter((e) => e.phase === 'warm').length, units: 'events' },
      { key: 'events.cold.count', label: 'Number of cold events', value: rows.filter((e) => e.phase === 'cold').length, units: 'events' },
    ];
    for (const e of rows) {
      numbers.push({ key: `event.${e.peak}.peakValue`, label: `Peak ${index.name} anomaly of the ${e.phase} event peaking ${e.peak}`, value: e.peakValue, units: index.units });
      for (const c of carbon) {
        numbers.push({ key: `event.${e.peak}.${c.seriesId}.PgC`, label: `Change of ${c.name} over the ${e.phase} event peaking ${e.peak}`, value: e.carbon[c.seriesId], units: 'Pg C' });
      }
    }
    const strongest = rows.reduce<(typeof rows)[number] | null>(
      (a, b) => (b.peakValue !== null && (a === null || Math.abs(b.peakValue) > Math.abs(a.peakValue!)) ? b : a),
      null,
    );
    const at = strongest ? ` (${strongest.phase}, peak ${strongest.peak})` : '';
    numbers.push(
      { key: 'strongest.peakValue', label: `Peak ${index.name} anomaly of the strongest event${at}`, value: strongest?.peakValue ?? null, units: index.units },
      { key: 'strongest.months', label: `Duration of the strongest event${at}`, value: strongest?.months ?? null, units: 'months' },
      ...carbon.map((c) => ({ key: `strongest.${c.seriesId}.PgC`, label: `Change of ${c.name} over the strongest event${at}`, value: strongest ? strongest.carbon[c.seriesId] : null, units: 'Pg C' })),
    );
    return {
      data: { carbonSeries: plans.map(({ c, plan }) => ({ seriesId: c.seriesId, name: c.name, units: c.units, treatment: plan.treatment })), rows },
      numbers,
      methods: eventTableMethods(r, index, carbon, ev.clause),
      cautions: [],
      warnings,
    };
  },
};

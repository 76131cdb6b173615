/** Each event of the index and, per bound carbon series, the carbon change over the event in Pg C. */
import { z } from 'zod';
import { defineFigureKind } from '../kind';
import { anomalyField, eventSourceField, FIGURE_LIMITS, seriesBindingSchema } from '../shared/recipe-parts';
import { figureEventSchema, nullableNumber } from '../shared/result-parts';

/** Recipe of an event table. */
export const eventTableRecipeSchema = z.strictObject({
  kind: z.literal('event-table'),
  index: seriesBindingSchema,
  /** Carbon series whose change over each event is reported (rates are integrated; inventories differenced). */
  carbon: z.array(seriesBindingSchema).max(FIGURE_LIMITS.maxBoundSeries).default([]),
  anomaly: anomalyField(),
  events: eventSourceField(),
});

/** How a carbon series' change over an event was found. */
export const carbonTreatmentSchema = z.enum(['rate-integrated', 'inventory-difference']).nullable();
export type CarbonTreatment = z.output<typeof carbonTreatmentSchema>;

/** `data` of an event table: one row per event; `carbon[seriesId]` is the change in Pg C (null when it cannot be computed). */
export const eventTableResultSchema = z.object({
  carbonSeries: z.array(z.object({ seriesId: z.string(), name: z.string(), units: z.string(), treatment: carbonTreatmentSchema })),
  rows: z.array(figureEventSchema.extend({ carbon: z.record(z.string(), nullableNumber()) })),
});
export type EventTableData = z.output<typeof eventTableResultSchema>;

/** The event-table kind: drawn as an HTML table, not a chart. */
export const eventTableKind = defineFigureKind({
  kind: 'event-table',
  label: 'Event table',
  recipe: eventTableRecipeSchema,
  skeleton: { index: { seriesId: '', version: 'latest' } },
  result: eventTableResultSchema,
  spec: () => null,
  table: (d) => ({
    header: ['phase', 'start', 'peak', 'end', 'months', 'peak value', 'strength', ...d.carbonSeries.map((c) => `${c.name} (Pg C)`)],
    rows: d.rows.map((e) => [e.phase, e.start, e.peak, e.end, e.months, e.peakValue, e.strength ?? '', ...d.carbonSeries.map((c) => e.carbon[c.seriesId] ?? null)]),
  }),
});

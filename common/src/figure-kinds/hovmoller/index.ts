/** A time–latitude (Hovmöller) diagram of a stored zonal mean, raw or as anomalies of each latitude. */
import { z } from 'zod';
import { defineFigureKind } from '../kind';
import { basePeriodSchema, DEFAULT_BASE_PERIOD } from '../shared/recipe-parts';
import { nullableNumber } from '../shared/result-parts';
import { hovmollerSpec } from './spec';

/** Recipe of a time–latitude diagram. */
export const hovmollerRecipeSchema = z.strictObject({
  kind: z.literal('hovmoller'),
  zonalFieldId: z.uuid(),
  show: z.enum(['raw', 'anomaly']).default('anomaly'),
  base: basePeriodSchema.default(DEFAULT_BASE_PERIOD),
});

/** `data` of a time–latitude diagram: one record per month and latitude, time-major. */
export const hovmollerResultSchema = z.object({
  units: z.string(),
  show: z.enum(['raw', 'anomaly']),
  latitudes: z.array(z.number()),
  cells: z.array(z.object({ month: z.string(), lat: z.number(), value: nullableNumber() })),
});
export type HovmollerData = z.output<typeof hovmollerResultSchema>;

/** The Hovmöller kind. */
export const hovmollerKind = defineFigureKind({
  kind: 'hovmoller',
  label: 'Time–latitude diagram',
  recipe: hovmollerRecipeSchema,
  skeleton: { zonalFieldId: '' },
  result: hovmollerResultSchema,
  spec: hovmollerSpec,
  table: (d) => ({ header: ['month', 'latitude', `value (${d.units})`], rows: d.cells.map((c) => [c.month, c.lat, c.value]) }),
});

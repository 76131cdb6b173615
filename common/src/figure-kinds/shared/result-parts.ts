/**
 * Pieces shared by the result schemas of several figure kinds: a month's value and an event as the
 * server sends them and the specs read them. Months are "YYYY-MM"; a missing value is null.
 */
import { z } from 'zod';
import { phaseSchema } from './recipe-parts';

const num = z.number().nullable();

/** A month's value, the record vega-lite plots on a temporal x axis. */
export const monthValueSchema = z.object({ month: z.string(), value: num });
export type MonthValue = z.output<typeof monthValueSchema>;

/** One event as a figure or a detection shows it; peakValue and strength are null where the index has no value at the peak. */
export const figureEventSchema = z.object({
  phase: phaseSchema,
  start: z.string(),
  peak: z.string(),
  end: z.string(),
  months: z.number(),
  peakValue: num,
  strength: z.enum(['weak', 'moderate', 'strong', 'very strong']).nullable(),
  label: z.string(),
});
export type FigureEvent = z.output<typeof figureEventSchema>;

/** One series version a figure was computed from. */
export const usedSeriesSchema = z.object({
  seriesId: z.string(),
  name: z.string(),
  version: z.number(),
  units: z.string(),
  origin: z.string(),
  valuesSha256: z.string(),
});
export type UsedSeries = z.infer<typeof usedSeriesSchema>;

/** Nullable number, the shape of every statistic that may be undefined. */
export const nullableNumber = () => num;

import { z } from 'zod';
import { MAX_LAG_MONTHS, MAX_SERIES_MONTHS, yearMonthSchema } from './analysis';

/** Limits of POST /api/fields/:fieldId/maps, shared by forms and the server. */
export const MAP_LIMITS = {
  /** Most months before or after an event peak in a composite. */
  maxOffset: 36,
  /** Phase-randomisation surrogates: default, bounds, and the most surrogates × cells held at once (≈ 160 MB of doubles). */
  surrogatesDefault: 1000,
  surrogatesMin: 100,
  surrogatesMax: 5000,
  maxSurrogateCells: 20_000_000,
} as const;

const monthRange = z
  .strictObject({ from: yearMonthSchema, to: yearMonthSchema })
  .refine((r) => r.from <= r.to, 'a period must end on or after the month it starts');
const latRange = z.tuple([z.number().min(-90).max(90), z.number().min(-90).max(90)]);
const lonRange = z.tuple([z.number().min(-360).max(360), z.number().min(-360).max(720)]);

/** An index bound to a stored series (a version number, or the latest), or given inline. */
const mapIndexSchema = z.union([
  z.strictObject({ seriesId: z.uuid(), version: z.union([z.literal('latest'), z.number().int().min(1)]).optional() }),
  z.strictObject({ start: yearMonthSchema, values: z.array(z.number().nullable()).min(1).max(MAX_SERIES_MONTHS) }),
]);

/**
 * Body of POST /api/fields/:fieldId/maps: a time-mean, mean-anomaly, event-composite, correlation
 * or regression map of a (time, lat, lon) field. `months`: month numbers 1–12 or a season of
 * consecutive initials ("DJF"). `lag`: months by which the index leads the field. `offsets`:
 * months after (+) or before (−) each event peak (default [0]). `significance`: 't-test' (default;
 * Welch or one-sample for composites, the nEff t test for correlations), 'phase-randomised'
 * (Ebisuzaki 1997, correlation and regression only, seeded), or 'none'. Cells pass under
 * Benjamini–Hochberg FDR control at α_FDR = 2·alpha (Wilks 2016). `region`: lat [south, north]
 * and lon [west, east] eastward (may cross the antimeridian); the whole field by default.
 */
export const mapRequestSchema = z
  .strictObject({
    mode: z.enum(['mean', 'anomaly-at', 'composite', 'correlation', 'regression']),
    period: monthRange.optional(),
    base: monthRange.optional(),
    months: z.union([z.array(z.number().int().min(1).max(12)).min(1).max(12), z.string().regex(/^[JFMASOND]{2,12}$/i, 'months must be month numbers 1–12 or a season such as DJF')]).optional(),
    minYears: z.number().int().min(1).max(2000).optional(),
    index: mapIndexSchema.optional(),
    lag: z.number().int().min(-MAX_LAG_MONTHS).max(MAX_LAG_MONTHS).optional(),
    eventSetId: z.uuid().optional(),
    phase: z.enum(['warm', 'cold']).optional(),
    offsets: z.array(z.number().int().min(-MAP_LIMITS.maxOffset).max(MAP_LIMITS.maxOffset)).min(1).max(2 * MAP_LIMITS.maxOffset + 1).optional(),
    baseline: z.enum(['none', 'neutral']).optional(),
    significance: z.enum(['none', 't-test', 'phase-randomised']).optional(),
    alpha: z.number().gt(0).max(0.5).optional(),
    surrogates: z.number().int().min(MAP_LIMITS.surrogatesMin).max(MAP_LIMITS.surrogatesMax).optional(),
    seed: z.number().int().min(0).max(4_294_967_295).optional(),
    region: z
      .strictObject({ lat: latRange.optional(), lon: lonRange.optional() })
      .refine((r) => !r.lat || r.lat[0] !== r.lat[1], 'region.lat must be two different latitudes')
      .optional(),
  })
  .superRefine((b, ctx) => {
    const needsIndex = b.mode === 'correlation' || b.mode === 'regression';
    if (needsIndex && !b.index) ctx.addIssue({ code: 'custom', path: ['index'], message: `a ${b.mode} map needs an index ({ seriesId } or { start, values })` });
    if (!needsIndex && (b.index || b.lag !== undefined)) ctx.addIssue({ code: 'custom', path: [b.index ? 'index' : 'lag'], message: `index and lag belong to correlation and regression maps, not ${b.mode}` });
    if (b.mode === 'composite' && !b.eventSetId) ctx.addIssue({ code: 'custom', path: ['eventSetId'], message: 'a composite map needs an eventSetId' });
    if (b.mode !== 'composite' && (b.eventSetId || b.offsets || b.phase || b.baseline)) ctx.addIssue({ code: 'custom', path: ['eventSetId'], message: `eventSetId, offsets, phase and baseline belong to composite maps, not ${b.mode}` });
    if (b.significance === 'phase-randomised' && !needsIndex) ctx.addIssue({ code: 'custom', path: ['significance'], message: 'phase-randomised p is for correlation and regression maps' });
  });
export type MapRequestBody = z.output<typeof mapRequestSchema>;

/** Answer of POST /api/fields/:fieldId/maps: values row-major (lat × lon), null where undefined. */
export const mapResponseSchema = z.object({
  lat: z.array(z.number()),
  lon: z.array(z.number()),
  values: z.array(z.number().nullable()),
  p: z.array(z.number().nullable()).optional(),
  significant: z.array(z.boolean()).optional(),
  units: z.string(),
  counts: z.record(z.string(), z.number()),
  warnings: z.array(z.string()),
});
export type MapResponse = z.infer<typeof mapResponseSchema>;

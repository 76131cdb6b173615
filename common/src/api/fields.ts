import { z } from 'zod';
import { plainText } from './text';
import { SERIES_KINDS } from './series';

const latRange = z
  .tuple([z.number().min(-90).max(90), z.number().min(-90).max(90)])
  .refine(([s, n]) => s < n, 'lat must be [south, north] with south below north');
const lonRange = z.tuple([z.number().min(-360).max(360), z.number().min(-360).max(720)]);
const depthRange = z
  .tuple([z.number().min(0).max(11_000), z.number().min(0).max(11_000)])
  .refine(([t, b]) => t < b, 'depth must be [top, bottom] in metres with top above bottom');

/**
 * Body of POST /api/fields/:fieldId/reductions: an area-weighted regional mean
 * or integral over a lat/lon box (optionally a depth range) becomes a series,
 * or a version of an existing one (`seriesId`); a zonal mean over a longitude
 * band becomes a time × latitude field for time–latitude diagrams.
 */
export const reduceFieldRequestSchema = z.discriminatedUnion('kind', [
  z.strictObject({
    kind: z.enum(['box-mean', 'box-integral']),
    name: plainText({ what: 'name' }).trim().min(1).max(160),
    seriesKind: z.enum(SERIES_KINDS).default('other'),
    lat: latRange,
    lon: lonRange,
    depth: depthRange.optional(),
    seriesId: z.uuid().optional(),
  }),
  z.strictObject({
    kind: z.literal('zonal-mean'),
    name: plainText({ what: 'name' }).trim().min(1).max(160),
    lon: lonRange,
    lat: latRange.optional(),
    depth: depthRange.optional(),
  }),
]);
export type ReduceFieldRequest = z.input<typeof reduceFieldRequestSchema>;
export type ReduceFieldBody = z.output<typeof reduceFieldRequestSchema>;

/** A gridded variable kept from an upload. */
export const griddedFieldSchema = z.object({
  id: z.string(),
  groupId: z.string(),
  variable: z.string(),
  longName: z.string(),
  units: z.string(),
  dims: z.array(z.string()),
  shape: z.array(z.number()),
  start: z.string(),
  extent: z.tuple([z.number(), z.number(), z.number(), z.number()]),
  fileName: z.string(),
  createdAt: z.string(),
});
export type GriddedFieldView = z.infer<typeof griddedFieldSchema>;

/** A stored zonal mean (time × latitude), with its values. */
export const zonalMeanFieldSchema = z.object({
  id: z.string(),
  groupId: z.string(),
  name: z.string(),
  start: z.string(),
  months: z.number(),
  latitudes: z.array(z.number()),
  units: z.string(),
  provenance: z.record(z.string(), z.unknown()),
  createdAt: z.string(),
  /** values[month][latitude]; null where missing. Only in the single-field answer. */
  values: z.array(z.array(z.number().nullable())).optional(),
});
export type ZonalMeanFieldView = z.infer<typeof zonalMeanFieldSchema>;

/** Answer of GET /api/groups/:groupId/fields. */
export const fieldsListSchema = z.object({ gridded: z.array(griddedFieldSchema), zonal: z.array(zonalMeanFieldSchema) });
export type FieldsList = z.infer<typeof fieldsListSchema>;

/** Answer of a reduction. */
export const reduceFieldResponseSchema = z.object({
  series: z.object({ id: z.string(), name: z.string(), version: z.number(), created: z.boolean() }).nullable(),
  zonal: zonalMeanFieldSchema.nullable(),
});
export type ReduceFieldResponse = z.infer<typeof reduceFieldResponseSchema>;

import { z } from 'zod';
import { plainText } from './text';
import { STANDARD_BOXES } from '../regions/standard-boxes';

/** Limits of region sets and regional budgets, shared by forms and server. */
export const REGION_LIMITS = {
  nameMax: 160,
  regionsMax: 64,
  verticesMax: 20_000,
  depthLimitsMax: 4,
  termsMax: 12,
  maxDepthM: 11_000,
} as const;

const name = plainText({ what: 'name' }).trim().min(1).max(REGION_LIMITS.nameMax);
const position = z.tuple([z.number().min(-540).max(540), z.number().min(-90).max(90)]);
const ring = z.array(position).min(4, 'a ring needs at least 4 positions (closed)').max(REGION_LIMITS.verticesMax);
const polygon = z.strictObject({ type: z.literal('Polygon'), coordinates: z.array(ring).min(1).max(100) });
const multiPolygon = z.strictObject({ type: z.literal('MultiPolygon'), coordinates: z.array(z.array(ring).min(1).max(100)).min(1).max(100) });

/** A GeoJSON FeatureCollection (RFC 7946) of named Polygon/MultiPolygon regions. */
export const regionFeatureCollectionSchema = z.strictObject({
  type: z.literal('FeatureCollection'),
  features: z
    .array(
      z.object({
        type: z.literal('Feature'),
        properties: z.object({ name }).loose(),
        geometry: z.discriminatedUnion('type', [polygon, multiPolygon]),
      }),
    )
    .min(1, 'the FeatureCollection holds no region')
    .max(REGION_LIMITS.regionsMax),
});

const BOX_IDS = STANDARD_BOXES.map((b) => b.id) as [string, ...string[]];

/** Where a region set's regions come from. */
export const regionSetSourceSchema = z.discriminatedUnion('kind', [
  /** An integer mask variable with flag_values/flag_meanings in an uploaded NetCDF file. */
  z.strictObject({ kind: z.literal('mask'), uploadId: z.uuid(), variable: plainText({ what: 'variable' }).trim().min(1).max(200) }),
  z.strictObject({ kind: z.literal('geojson'), geojson: regionFeatureCollectionSchema }),
  z.strictObject({ kind: z.literal('standard-boxes'), boxIds: z.array(z.enum(BOX_IDS)).min(1).max(BOX_IDS.length) }),
]);
export type RegionSetSource = z.infer<typeof regionSetSourceSchema>;

/** Body of POST /api/groups/:groupId/region-sets. */
export const createRegionSetRequestSchema = z.strictObject({ name, source: regionSetSourceSchema });
export type CreateRegionSetBody = z.infer<typeof createRegionSetRequestSchema>;

/** Body of POST /api/region-sets/:regionSetId/versions. */
export const addRegionSetVersionRequestSchema = z.strictObject({ source: regionSetSourceSchema });
export type AddRegionSetVersionBody = z.infer<typeof addRegionSetVersionRequestSchema>;

/** One region of a version: its name, its mask code (mask sets) and cell count (when fixed by a grid). */
export const regionEntrySchema = z.object({ name: z.string(), code: z.number().nullable(), cells: z.number().nullable() });

/** A version of a region set. */
export const regionSetVersionSchema = z.object({
  number: z.number(),
  kind: z.enum(['mask', 'geojson', 'standard-boxes']),
  regions: z.array(regionEntrySchema),
  /** The grid a mask lives on (null for polygons and boxes, which fit any grid). */
  grid: z.object({ dims: z.array(z.string()), shape: z.array(z.number()), file: z.string() }).nullable(),
  createdAt: z.string(),
});
export type RegionSetVersionView = z.infer<typeof regionSetVersionSchema>;

/** A region set with its versions, newest last. */
export const regionSetSchema = z.object({ id: z.string(), groupId: z.string(), name: z.string(), versions: z.array(regionSetVersionSchema) });
export type RegionSetView = z.infer<typeof regionSetSchema>;

/** Answer of GET /api/groups/:groupId/region-sets. */
export const regionSetListSchema = z.object({ regionSets: z.array(regionSetSchema) });
export type RegionSetList = z.infer<typeof regionSetListSchema>;

export const BUDGET_ROLES = ['tendency', 'advection', 'diffusion', 'biology', 'air-sea-flux', 'other'] as const;

/**
 * Body of POST /api/groups/:groupId/regional-budgets: gridded budget terms (mol m-3 s-1) of one
 * uploaded NetCDF file on its native grid, each mapped to a role with its sign (+1: positive adds
 * carbon), integrated over every region of a region set for 0–H m (each of `depthLimits`) and full
 * depth, stored as derived series (one per region × depth × term, plus residual and inventory).
 */
export const regionalBudgetRequestSchema = z
  .strictObject({
    uploadId: z.uuid(),
    regionSetId: z.uuid(),
    regionSetVersion: z.number().int().min(1).optional(),
    terms: z
      .array(z.strictObject({ variable: plainText({ what: 'variable' }).trim().min(1).max(200), role: z.enum(BUDGET_ROLES), sign: z.union([z.literal(1), z.literal(-1)]).default(1) }))
      .min(1)
      .max(REGION_LIMITS.termsMax),
    inventoryVariable: plainText({ what: 'inventoryVariable' }).trim().min(1).max(200).optional(),
    depthLimits: z.array(z.number().positive().max(REGION_LIMITS.maxDepthM)).max(REGION_LIMITS.depthLimitsMax).default([100]),
    units: z.enum(['Pg C/yr', 'mol/s']).default('Pg C/yr'),
    namePrefix: plainText({ what: 'namePrefix' }).trim().min(1).max(80),
  })
  .refine((b) => b.terms.filter((t) => t.role === 'tendency').length === 1, 'terms: map exactly one variable to the tendency')
  .refine((b) => new Set(b.terms.map((t) => t.variable)).size === b.terms.length, 'terms: each variable may be mapped once');
export type RegionalBudgetBody = z.infer<typeof regionalBudgetRequestSchema>;

/** Answer of POST /api/groups/:groupId/regional-budgets. */
export const regionalBudgetResponseSchema = z.object({
  series: z.array(z.object({ id: z.string(), name: z.string(), version: z.number(), created: z.boolean(), region: z.string(), depth: z.string(), quantity: z.string() })),
  closure: z.array(z.object({ region: z.string(), depth: z.string(), relativeClosure: z.number().nullable() })),
});
export type RegionalBudgetResponse = z.infer<typeof regionalBudgetResponseSchema>;

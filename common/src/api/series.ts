import { z } from 'zod';
import { plainText } from './text';
import { userSchema } from './auth';

/** What a stored series measures. */
export const SERIES_KINDS = ['climate-index', 'carbon-inventory', 'budget-term', 'flux', 'other'] as const;
export type SeriesKind = (typeof SERIES_KINDS)[number];

/** Words shown for each kind. */
export const SERIES_KIND_LABELS: Record<SeriesKind, string> = {
  'climate-index': 'Climate index',
  'carbon-inventory': 'Carbon inventory',
  'budget-term': 'Budget term',
  flux: 'Flux',
  other: 'Other',
};

/**
 * Where the numbers come from. Figures say "model output" plainly so that a
 * model run is never read as observation.
 */
export const DATA_ORIGINS = ['model-output', 'observation', 'reanalysis', 'derived', 'unspecified'] as const;
export type DataOrigin = (typeof DATA_ORIGINS)[number];

export const SERIES_LIMITS = {
  nameMax: 160,
  textMax: 200,
  notesMax: 4000,
  pageSizeMax: 200,
  /** Points in a library sparkline. */
  sparklinePoints: 120,
} as const;

const field = (what: string, max: number = SERIES_LIMITS.textMax) =>
  plainText({ what, multiline: what === 'notes' }).trim().max(max, `${what} must be at most ${max} characters`);

/** The describing fields of a series, as a person edits them. */
export const seriesMetadataSchema = z.strictObject({
  name: field('name', SERIES_LIMITS.nameMax).min(1, 'name must not be empty'),
  kind: z.enum(SERIES_KINDS, { error: `kind must be one of ${SERIES_KINDS.join(', ')}` }),
  variable: field('variable').default(''),
  units: field('units').default(''),
  region: field('region').default(''),
  depthLayer: field('depth layer').default(''),
  source: field('source').default(''),
  origin: z.enum(DATA_ORIGINS, { error: `origin must be one of ${DATA_ORIGINS.join(', ')}` }).default('unspecified'),
  notes: field('notes', SERIES_LIMITS.notesMax).default(''),
});
export type SeriesMetadata = z.infer<typeof seriesMetadataSchema>;

/** Body of PATCH /api/series/:seriesId. */
export const updateSeriesRequestSchema = seriesMetadataSchema
  .partial()
  .refine((b) => Object.keys(b).length > 0, 'give at least one field to change');
export type UpdateSeriesRequest = z.infer<typeof updateSeriesRequestSchema>;

/** Query of GET /api/groups/:groupId/series. */
export const listSeriesQuerySchema = z.strictObject({
  q: plainText({ what: 'q' }).trim().max(200).optional(),
  kind: z.enum(SERIES_KINDS).optional(),
  sort: z.enum(['name', 'updated', 'kind']).default('name'),
  order: z.enum(['asc', 'desc']).default('asc'),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(SERIES_LIMITS.pageSizeMax).default(25),
});
export type ListSeriesQuery = z.infer<typeof listSeriesQuerySchema>;

/** How a version's values were made from what was uploaded. */
export const seriesTransformSchema = z.union([
  z.object({ type: z.literal('csv-column'), column: z.string(), layout: z.string() }),
  z.object({ type: z.literal('netcdf-variable'), variable: z.string() }),
  z.object({ type: z.literal('grid-reduction'), fieldId: z.string(), method: z.string(), description: z.string() }),
  z.object({
    type: z.literal('regional-budget'),
    uploadId: z.string(),
    variables: z.array(z.string()),
    regionSetId: z.string(),
    regionSetVersion: z.number(),
    region: z.string(),
    depth: z.string(),
    description: z.string(),
  }),
]);
export type SeriesTransform = z.infer<typeof seriesTransformSchema>;

/** One version of a series, without its values. */
export const seriesVersionSchema = z.object({
  number: z.number(),
  start: z.string(),
  end: z.string(),
  length: z.number(),
  missing: z.number(),
  valuesSha256: z.string(),
  file: z.object({ name: z.string(), sha256: z.string(), size: z.number() }).nullable(),
  transform: seriesTransformSchema.nullable(),
  createdBy: userSchema,
  createdAt: z.string(),
  note: z.string(),
  /** CF calendar of the months (CF 1.11 §4.4.1), e.g. standard, noleap, 360_day. */
  calendar: z.string(),
});
export type SeriesVersionView = z.infer<typeof seriesVersionSchema>;

/** A series in the library table. */
export const seriesSummarySchema = seriesMetadataSchema.extend({
  id: z.string(),
  groupId: z.string(),
  latest: seriesVersionSchema.pick({ number: true, start: true, end: true, createdAt: true }).nullable(),
  /** A downsampled copy of the latest values (nulls kept) for the sparkline. */
  sparkline: z.array(z.number().nullable()),
  updatedAt: z.string(),
});
export type SeriesSummary = z.infer<typeof seriesSummarySchema>;

/** Answer of GET /api/groups/:groupId/series. */
export const seriesPageSchema = z.object({
  items: z.array(seriesSummarySchema),
  total: z.number(),
  page: z.number(),
  pageSize: z.number(),
});
export type SeriesPage = z.infer<typeof seriesPageSchema>;

/** Answer of GET /api/series/:seriesId. */
export const seriesDetailSchema = seriesSummarySchema.extend({
  versions: z.array(seriesVersionSchema),
  createdBy: userSchema,
  createdAt: z.string(),
});
export type SeriesDetail = z.infer<typeof seriesDetailSchema>;

/** Answer of GET /api/series/:seriesId/versions/:version/values: the monthly series itself. */
export const seriesValuesSchema = z.object({
  seriesId: z.string(),
  version: z.number(),
  start: z.string(),
  values: z.array(z.number().nullable()),
  units: z.string(),
});
export type SeriesValues = z.infer<typeof seriesValuesSchema>;

/** A version reference as figures and computations give it: a number, or "latest". */
export const versionRefSchema = z.union([z.literal('latest'), z.coerce.number().int().min(1)]);
export type VersionRef = z.infer<typeof versionRefSchema>;

/** Answer of GET /api/series/:seriesId/usage: notebooks whose figures or live numbers bind the series. */
export const seriesUsageSchema = z.object({
  notebooks: z.array(z.object({ id: z.string(), title: z.string() })),
  /** Notebooks that use it but that the asker holds no role on (counted, not named). */
  otherNotebooks: z.number(),
});
export type SeriesUsage = z.infer<typeof seriesUsageSchema>;

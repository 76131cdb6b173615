import { z } from 'zod';
import { plainText } from './text';
import { DATA_ORIGINS } from './series';
import { columnMappingSchema, csvImportPreviewSchema } from './series-import';

/** One variable of a NetCDF file as the import offers it. */
export const netcdfVariableCandidateSchema = z.object({
  name: z.string(),
  /** `series`: a 1-D variable on the time axis; `grid`: (time, [depth,] lat, lon); `unusable`: see reason. */
  use: z.enum(['series', 'grid', 'unusable']),
  dims: z.array(z.string()),
  shape: z.array(z.number()),
  units: z.string(),
  longName: z.string(),
  standardName: z.string(),
  start: z.string().nullable(),
  months: z.number().nullable(),
  missing: z.number().nullable(),
  reason: z.string().nullable(),
});
export type NetcdfVariableCandidate = z.infer<typeof netcdfVariableCandidateSchema>;

/** What a NetCDF upload holds. */
export const netcdfPreviewSchema = z.object({
  format: z.enum(['netcdf-classic', 'netcdf4']),
  calendar: z.string().nullable(),
  timeUnits: z.string().nullable(),
  /** Doubts about the time axis, e.g. stamps at month starts without bounds (possibly end-of-interval). */
  timeWarnings: z.array(z.string()),
  variables: z.array(netcdfVariableCandidateSchema),
  globalAttributes: z.record(z.string(), z.string()),
});
export type NetcdfPreview = z.infer<typeof netcdfPreviewSchema>;

/** Answer of POST /api/groups/:groupId/uploads: the staged file and what it holds. Nothing is stored as series yet. */
export const uploadPreviewSchema = z.object({
  uploadId: z.string(),
  fileName: z.string(),
  size: z.number(),
  sha256: z.string(),
  format: z.enum(['csv', 'netcdf-classic', 'netcdf4']),
  csv: csvImportPreviewSchema.nullable(),
  netcdf: netcdfPreviewSchema.nullable(),
});
export type UploadPreview = z.infer<typeof uploadPreviewSchema>;

/**
 * Body of POST /api/uploads/:uploadId/import. `columns` maps CSV columns, or
 * the 1-D variables of a NetCDF file (by variable name), to series; `grids`
 * keeps gridded NetCDF variables as fields; `targets` adds a column's values
 * as a new version of an existing series instead of a new series.
 */
export const importUploadRequestSchema = z
  .strictObject({
    origin: z.enum(DATA_ORIGINS).default('unspecified'),
    columns: z.array(columnMappingSchema).max(1000).default([]),
    grids: z.array(z.strictObject({ variable: plainText({ what: 'variable' }).min(1), name: plainText({ what: 'name' }).trim().min(1).max(160) })).max(100).default([]),
    targets: z.record(plainText({ what: 'a target column' }), z.uuid({ error: 'a target must be the id of an existing series' })).default({}),
  })
  .refine((b) => b.columns.some((c) => !c.skip) || b.grids.length > 0, 'choose at least one column, variable or field to import');
export type ImportUploadRequest = z.input<typeof importUploadRequestSchema>;
export type ImportUploadBody = z.output<typeof importUploadRequestSchema>;

/** Answer of the import: what was stored. */
export const importUploadResponseSchema = z.object({
  series: z.array(z.object({ id: z.string(), name: z.string(), version: z.number(), created: z.boolean() })),
  fields: z.array(z.object({ id: z.string(), name: z.string() })),
});
export type ImportUploadResponse = z.infer<typeof importUploadResponseSchema>;

/** One staged upload: received and previewed, nothing imported from it yet; deleted at `expiresAt`. */
export const stagedUploadSchema = z.object({
  uploadId: z.string(),
  fileName: z.string(),
  size: z.number(),
  format: z.enum(['csv', 'netcdf-classic', 'netcdf4']),
  uploadedBy: z.object({ id: z.string(), name: z.string() }),
  createdAt: z.string(),
  expiresAt: z.string(),
});
export type StagedUpload = z.infer<typeof stagedUploadSchema>;

/** Answer of GET /api/groups/:groupId/uploads: the group's staged uploads and the asking person's quota. */
export const stagedUploadsListSchema = z.object({
  uploads: z.array(stagedUploadSchema),
  quota: z.object({
    /** Bytes the asking person's staged uploads hold (all groups), against `stagedBytesPerPerson`. */
    stagedBytes: z.number(),
    stagedBytesPerPerson: z.number(),
    concurrentPerPerson: z.number(),
    stagedTtlHours: z.number(),
    idleTimeoutSeconds: z.number(),
  }),
});
export type StagedUploadsList = z.infer<typeof stagedUploadsListSchema>;

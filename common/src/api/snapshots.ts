import { z } from 'zod';
import { plainText } from './text';
import { userSchema } from './auth';
import { figureResultSchema, usedSeriesSchema } from '../figure-kinds';

/** Limits shared by the publish form and the server. */
export const SNAPSHOT_LIMITS = {
  titleMax: 200,
  releaseNoteMax: 5000,
  /** Bytes of a share token before base64url (256 bits, RFC 4086 §5 / OWASP session-id guidance). */
  shareTokenBytes: 32,
} as const;

/** Body of POST /api/notebooks/:notebookId/snapshots (lead author): publish the notebook as it stands. */
export const publishSnapshotRequestSchema = z.strictObject({
  title: plainText({ what: 'title', error: 'title is required' })
    .trim()
    .min(1, 'title must not be empty')
    .max(SNAPSHOT_LIMITS.titleMax, `title must be at most ${SNAPSHOT_LIMITS.titleMax} characters`),
  releaseNote: plainText({ what: 'releaseNote', multiline: true })
    .trim()
    .max(SNAPSHOT_LIMITS.releaseNoteMax, `releaseNote must be at most ${SNAPSHOT_LIMITS.releaseNoteMax} characters`)
    .default(''),
});
export type PublishSnapshotRequest = z.input<typeof publishSnapshotRequestSchema>;

/** A snapshot as listed: who published what, when, and the hash of its frozen content. */
export const snapshotSummarySchema = z.object({
  id: z.string(),
  notebookId: z.string(),
  /** 1, 2, … per notebook, in publishing order. */
  number: z.number().int(),
  title: z.string(),
  releaseNote: z.string(),
  publishedAt: z.string(),
  /** Null once the publisher's account is gone. */
  publishedBy: userSchema.nullable(),
  engineVersion: z.string(),
  editorSchemaVersion: z.number().int(),
  figureCount: z.number().int(),
  numberCount: z.number().int(),
  /** sha256 (hex) of the stored frozen payload bytes. */
  contentSha256: z.string(),
});
export type SnapshotSummary = z.infer<typeof snapshotSummarySchema>;

/** Answer of GET /api/notebooks/:notebookId/snapshots, newest first. */
export const snapshotListSchema = z.object({ snapshots: z.array(snapshotSummarySchema) });
export type SnapshotList = z.infer<typeof snapshotListSchema>;

/**
 * A live figure as it was at publishing: its recipe with every "latest" binding replaced by the
 * version number used, and the figure route's answer then — or why it could not be computed.
 * `recipe` is null (with an error) when the figure's form had never been saved.
 */
export const frozenFigureSchema = z.object({
  figureId: z.string(),
  /** 1-based: "Figure N". */
  ordinal: z.number().int(),
  caption: z.string(),
  recipe: z.record(z.string(), z.unknown()).nullable(),
  result: figureResultSchema.nullable(),
  error: z.string().nullable(),
});
export type FrozenFigure = z.infer<typeof frozenFigureSchema>;

/** A live number as it was at publishing, with the text it showed. */
export const frozenNumberSchema = z.object({
  /** 1-based position among the document's live numbers. */
  ordinal: z.number().int(),
  recipe: z.record(z.string(), z.unknown()).nullable(),
  key: z.string(),
  precision: z.number(),
  figureId: z.string().nullable(),
  value: z.number().nullable(),
  units: z.string().nullable(),
  /** Formatted as the live number showed it (formatLiveNumber); "n/a" when unavailable. */
  text: z.string(),
  error: z.string().nullable(),
});
export type FrozenNumber = z.infer<typeof frozenNumberSchema>;

/** Answer of GET /api/snapshots/:snapshotId and GET /api/shared/:token: the whole frozen snapshot. */
export const snapshotSchema = snapshotSummarySchema.extend({
  notebookTitle: z.string(),
  groupId: z.string(),
  groupName: z.string(),
  /** ProseMirror JSON of the document as published (type "doc"). */
  document: z.object({ type: z.literal('doc') }).loose(),
  /** In document order. */
  figures: z.array(frozenFigureSchema),
  /** In document order. */
  numbers: z.array(frozenNumberSchema),
});
export type SnapshotView = z.infer<typeof snapshotSchema>;

/** Body of POST /api/snapshots/:snapshotId/share-links (lead author): a public link, optionally expiring. */
export const createShareLinkRequestSchema = z.strictObject({
  expiresAt: z
    .iso.datetime({ offset: true, error: 'expiresAt must be an ISO-8601 date and time, e.g. 2030-01-31T12:00:00Z' })
    .refine((s) => Date.parse(s) > Date.now(), 'expiresAt must be in the future')
    .nullable()
    .default(null),
});
export type CreateShareLinkRequest = z.input<typeof createShareLinkRequestSchema>;

/** The states a share link can be in. */
export const SHARE_LINK_STATES = ['active', 'expired', 'revoked'] as const;

/** A share link as its owner sees it; the token itself is never shown again after creation. */
export const shareLinkSchema = z.object({
  id: z.string(),
  snapshotId: z.string(),
  createdAt: z.string(),
  createdBy: userSchema.nullable(),
  expiresAt: z.string().nullable(),
  revokedAt: z.string().nullable(),
  state: z.enum(SHARE_LINK_STATES),
  /** The token's last 4 characters, to tell links apart. */
  tokenHint: z.string(),
});
export type ShareLinkView = z.infer<typeof shareLinkSchema>;

/** Answer of creating a share link: the only time the token is shown. */
export const shareLinkCreatedSchema = shareLinkSchema.extend({
  token: z.string(),
  /** "/shared/<token>", to be put after the site's origin. */
  url: z.string(),
});
export type ShareLinkCreated = z.infer<typeof shareLinkCreatedSchema>;

/** Answer of GET /api/snapshots/:snapshotId/share-links. */
export const shareLinkListSchema = z.object({ links: z.array(shareLinkSchema) });
export type ShareLinkList = z.infer<typeof shareLinkListSchema>;

/** Query of GET /api/snapshots/:snapshotId/compare: `live` or the id of another snapshot of the same notebook. */
export const compareSnapshotQuerySchema = z.strictObject({
  with: z.union([z.literal('live'), z.uuid()], { error: 'with must be "live" or the id of a snapshot of the same notebook' }),
});
export type CompareSnapshotQuery = z.infer<typeof compareSnapshotQuerySchema>;

const snapshotSide = z.object({ kind: z.literal('snapshot'), id: z.string(), number: z.number().int(), title: z.string(), publishedAt: z.string() });
const changeStatus = z.enum(['added', 'removed', 'changed', 'unchanged']);

/** One figure's difference between two sides of a comparison, matched by figureId. */
export const figureChangeSchema = z.object({
  figureId: z.string(),
  ordinalBefore: z.number().int().nullable(),
  ordinalAfter: z.number().int().nullable(),
  status: changeStatus,
  captionBefore: z.string().nullable(),
  captionAfter: z.string().nullable(),
  recipeChanged: z.boolean(),
  seriesBefore: z.array(usedSeriesSchema),
  seriesAfter: z.array(usedSeriesSchema),
  /** From FigureResult.numbers, matched by key. */
  values: z.array(z.object({ key: z.string(), label: z.string(), units: z.string(), before: z.number().nullable(), after: z.number().nullable() })),
});
export type FigureChange = z.infer<typeof figureChangeSchema>;

/** One live number's difference, matched by ordinal, then by recipe and key. */
export const numberChangeSchema = z.object({
  ordinalBefore: z.number().int().nullable(),
  ordinalAfter: z.number().int().nullable(),
  key: z.string(),
  status: changeStatus,
  textBefore: z.string().nullable(),
  textAfter: z.string().nullable(),
  before: z.number().nullable(),
  after: z.number().nullable(),
  units: z.string().nullable(),
});
export type NumberChange = z.infer<typeof numberChangeSchema>;

/** Answer of GET /api/snapshots/:snapshotId/compare. */
export const snapshotComparisonSchema = z.object({
  from: snapshotSide,
  to: z.discriminatedUnion('kind', [snapshotSide, z.object({ kind: z.literal('live'), at: z.string() })]),
  /** Word-level diff of the document text; blocks are separated by "\n\n". */
  text: z.array(z.object({ op: z.enum(['equal', 'insert', 'delete']), text: z.string() })),
  figures: z.array(figureChangeSchema),
  numbers: z.array(numberChangeSchema),
});
export type SnapshotComparison = z.infer<typeof snapshotComparisonSchema>;

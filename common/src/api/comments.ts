import { z } from 'zod';
import { plainText } from './text';
import { userSchema } from './auth';

/** Limits shared by the composer and the server, so both refuse the same comment. */
export const COMMENT_LIMITS = {
  bodyMax: 4000,
  quoteMax: 500,
  /** Base64 of one encoded Yjs relative position; real ones are a few dozen characters. */
  positionMax: 512,
  figureIdMax: 100,
  mentionsMax: 20,
  /** How much of a comment a notification repeats. */
  excerptMax: 140,
} as const;

const base64 = plainText({ what: 'a position' })
  .min(4, 'a position must be a base64-encoded Yjs relative position')
  .max(COMMENT_LIMITS.positionMax, 'a position must be a base64-encoded Yjs relative position')
  .regex(/^[A-Za-z0-9+/]+={0,2}$/, 'a position must be a base64-encoded Yjs relative position');
const quote = plainText({ what: 'the quoted passage', multiline: true }).max(COMMENT_LIMITS.quoteMax, `the quoted passage must be at most ${COMMENT_LIMITS.quoteMax} characters`);

/**
 * What a thread discusses. A passage of text is held by two Yjs relative
 * positions (base64 of `Y.encodeRelativePosition`), which follow the text
 * through everyone's concurrent edits, plus the words quoted when the thread
 * was opened; a figure is held by its node's `id` attribute.
 */
export const commentAnchorSchema = z.discriminatedUnion(
  'type',
  [
    z.strictObject({ type: z.literal('text'), from: base64, to: base64, quote: quote.trim().min(1, 'quote the passage the comment is about') }),
    z.strictObject({ type: z.literal('figure'), figureId: plainText({ what: 'figureId' }).trim().min(1).max(COMMENT_LIMITS.figureIdMax), quote: quote.optional() }),
  ],
  { error: 'anchor must be { type: "text", from, to, quote } or { type: "figure", figureId }' },
);
export type CommentAnchor = z.infer<typeof commentAnchorSchema>;

/** Plain text: stored as written and shown as text, never as HTML. */
export const commentBodySchema = plainText({ what: 'a comment', error: 'body is required', multiline: true })
  .trim()
  .min(1, 'write something before sending')
  .max(COMMENT_LIMITS.bodyMax, `a comment must be at most ${COMMENT_LIMITS.bodyMax} characters`);

/**
 * People the author picked from the mention list (their user ids). Only those
 * who can read the notebook are notified; the `@Name` in the body is for people.
 */
const mentions = z.array(z.uuid()).max(COMMENT_LIMITS.mentionsMax).default([]);

/** Body of POST /api/notebooks/:notebookId/comments. */
export const createCommentThreadRequestSchema = z.strictObject({ anchor: commentAnchorSchema, body: commentBodySchema, mentions });
export type CreateCommentThreadRequest = z.input<typeof createCommentThreadRequestSchema>;

/** Body of POST /api/notebooks/:notebookId/comments/:threadId/replies. */
export const createCommentReplyRequestSchema = z.strictObject({ body: commentBodySchema, mentions });
export type CreateCommentReplyRequest = z.input<typeof createCommentReplyRequestSchema>;

/** Query of GET /api/notebooks/:notebookId/comments. */
export const listCommentsQuerySchema = z.strictObject({ status: z.enum(['open', 'resolved', 'all']).default('all') });
export type CommentStatusFilter = z.infer<typeof listCommentsQuerySchema>['status'];

/** One reply in a thread. */
export const commentReplySchema = z.object({
  id: z.string(),
  threadId: z.string(),
  author: userSchema,
  body: z.string(),
  createdAt: z.string(),
  /** Whether the person asking may delete it (its author or the lead author). */
  canDelete: z.boolean(),
});
export type CommentReplyView = z.infer<typeof commentReplySchema>;

/** A thread: the first comment on an anchor, its replies, and whether it is resolved. */
export const commentThreadSchema = z.object({
  id: z.string(),
  notebookId: z.string(),
  /** 1, 2, 3… in document order where the anchor is found, then by creation for the rest. */
  number: z.number().int(),
  anchor: commentAnchorSchema,
  /** False when the passage or figure is no longer in the document. */
  anchorFound: z.boolean(),
  author: userSchema,
  body: z.string(),
  createdAt: z.string(),
  resolved: z.object({ by: userSchema, at: z.string() }).nullable(),
  replies: z.array(commentReplySchema),
  canDelete: z.boolean(),
});
export type CommentThreadView = z.infer<typeof commentThreadSchema>;

/** Answer of GET /api/notebooks/:notebookId/comments. */
export const commentThreadListSchema = z.object({
  threads: z.array(commentThreadSchema),
  /** Counts over the whole notebook, whatever the filter. */
  open: z.number().int(),
  resolved: z.number().int(),
});
export type CommentThreadList = z.infer<typeof commentThreadListSchema>;

import { z } from 'zod';
import { plainText } from './text';

/** Largest single Yjs update accepted over HTTP, as base64 characters (about 3 MB of update). */
export const MAX_UPDATE_BASE64 = 4_000_000;

/** Answer of GET /api/notebooks/:notebookId/document: the whole Yjs state as one update. */
export const documentStateSchema = z.object({
  notebookId: z.string(),
  /** Y.encodeStateAsUpdate of the document, base64. */
  state: z.string(),
  updatedAt: z.string(),
});
export type DocumentState = z.infer<typeof documentStateSchema>;

/** Body of POST /api/notebooks/:notebookId/document/updates: one Yjs update (or several merged), base64. */
export const documentUpdateRequestSchema = z.strictObject({
  update: plainText({ what: 'update' })
    .min(4)
    .max(MAX_UPDATE_BASE64, 'the update is too large; send smaller changes more often')
    .regex(/^[A-Za-z0-9+/]+={0,2}$/, 'update must be base64'),
});
export type DocumentUpdateRequest = z.infer<typeof documentUpdateRequestSchema>;

/** Answer once an update is stored. */
export const documentUpdateResponseSchema = z.object({ stored: z.boolean(), updatedAt: z.string() });
export type DocumentUpdateResponse = z.infer<typeof documentUpdateResponseSchema>;

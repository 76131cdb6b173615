import { z } from 'zod';
import { plainText } from './text';
import { userSchema } from './auth';

/** Longest checkpoint name, shared by the form and the server. */
export const CHECKPOINT_NAME_MAX = 120;

/** Body of POST /api/notebooks/:notebookId/checkpoints: a name for the document as it stands now. */
export const createCheckpointRequestSchema = z.strictObject({
  name: plainText({ what: 'name', error: 'name is required' })
    .trim()
    .min(1, 'name must not be empty')
    .max(CHECKPOINT_NAME_MAX, `name must be at most ${CHECKPOINT_NAME_MAX} characters`),
});
export type CreateCheckpointRequest = z.infer<typeof createCheckpointRequestSchema>;

/** A named checkpoint of a notebook's document, as listed in its version history. */
export const checkpointSchema = z.object({
  id: z.string(),
  notebookId: z.string(),
  name: z.string(),
  /** Who named it; null once their account is gone. */
  createdBy: userSchema.nullable(),
  createdAt: z.string(),
});
export type CheckpointView = z.infer<typeof checkpointSchema>;

/** Answer of POST .../checkpoints/:checkpointId/restore: the live document now has the checkpoint's content. */
export const restoreCheckpointResponseSchema = z.object({
  checkpoint: checkpointSchema,
  /** Whether restoring changed anything (false when the document already matched). */
  changed: z.boolean(),
  restoredAt: z.string(),
});
export type RestoreCheckpointResponse = z.infer<typeof restoreCheckpointResponseSchema>;

import type { CheckpointView } from '@upwell/common';
import { presentUser } from '../users/user.presenter';
import type { Checkpoint } from './checkpoint.entity';

/** A checkpoint as listed in the version history (without its stored state). */
export function presentCheckpoint(c: Checkpoint): CheckpointView {
  return {
    id: c.id,
    notebookId: c.notebook.id,
    name: c.name,
    createdBy: c.createdBy ? presentUser(c.createdBy) : null,
    createdAt: c.createdAt.toISOString(),
  };
}

import type { ModuleRef } from '@nestjs/core';
import type { User } from '../../users/user.entity';

/**
 * Publishes the demo's snapshot of the event analysis, before release 2 is
 * imported, so the live notebook and the snapshot differ. Answers the
 * snapshot's number, or null where this build has no snapshots.
 */
export async function publishDemoSnapshot(_moduleRef: ModuleRef, _lead: User, _notebookId: string): Promise<number | null> {
  // Wired to the snapshots service when the snapshots module is merged (see the demo-seed report).
  return null;
}

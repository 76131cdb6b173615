import type { ModuleRef } from '@nestjs/core';
import { SnapshotsService } from '../../snapshots/snapshots.service';
import type { User } from '../../users/user.entity';

/** Title and release note of the demo's published snapshot. */
export const DEMO_SNAPSHOT = {
  title: 'Draft for the group meeting',
  releaseNote: 'First complete pass over the strongest warm event, computed from release 1 of the hindcast. Release 2 of the model output came later; compare this snapshot with the live notebook to see what it changed.',
} as const;

/**
 * Publishes the demo's snapshot of the event analysis through the snapshots
 * service, before release 2 is imported, so the live notebook and the
 * snapshot differ. Answers the snapshot's number.
 */
export async function publishDemoSnapshot(moduleRef: ModuleRef, lead: User, notebookId: string): Promise<number> {
  const snapshots = moduleRef.get(SnapshotsService, { strict: false });
  const published = JSON.parse(await snapshots.publish(lead, notebookId, { ...DEMO_SNAPSHOT })) as { number: number };
  return published.number;
}

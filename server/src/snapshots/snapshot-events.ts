/** In-process event emitted once a snapshot is stored (the mail module tells the notebook's readers). */
export const SNAPSHOT_PUBLISHED = 'snapshot.published';

/** Payload of `snapshot.published`. */
export interface SnapshotPublishedEvent {
  snapshotId: string;
  notebookId: string;
  number: number;
  title: string;
  publishedById: string;
}

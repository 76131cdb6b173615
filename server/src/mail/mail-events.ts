/** In-process events that lead to notification mail (emitted with @nestjs/event-emitter). */
export const MAIL_EVENTS = {
  /** A snapshot of a notebook was published; payload SnapshotPublishedEvent. */
  snapshotPublished: 'snapshot.published',
  /** People were @-mentioned in a comment; payload MentionsCreatedEvent. */
  mentionsCreated: 'comment.mentions-created',
} as const;

/** Payload of `snapshot.published`. */
export interface SnapshotPublishedEvent {
  snapshotId: string;
  notebookId: string;
  number: number;
  title: string;
  publishedById: string;
}

/** Payload of `comment.mentions-created`: the in-app notifications just committed. */
export interface MentionsCreatedEvent {
  notificationIds: string[];
}

/**
 * Socket.IO event names and payloads shared by the web client and the
 * server's gateway, so neither side spells them on its own.
 */
export const SOCKET_EVENTS = {
  /** Server → client: a series of one of your groups got a new version. */
  seriesVersionCreated: 'series:version-created',
  /** Server → client: a series was deleted. */
  seriesDeleted: 'series:deleted',
  /** Server → uploader: how far the processing of an upload has come. */
  uploadProgress: 'upload:progress',
  /** Server → everyone who can read the notebook: a comment thread was opened. */
  commentThreadCreated: 'comments:thread-created',
  /** Server → everyone who can read the notebook: a reply was added to a thread. */
  commentReplyAdded: 'comments:reply-added',
  /** Server → everyone who can read the notebook: a thread was resolved. */
  commentThreadResolved: 'comments:thread-resolved',
  /** Server → everyone who can read the notebook: a resolved thread was reopened. */
  commentThreadReopened: 'comments:thread-reopened',
  /** Server → everyone who can read the notebook: a thread and its replies were deleted. */
  commentThreadDeleted: 'comments:thread-deleted',
  /** Server → everyone who can read the notebook: one reply was deleted. */
  commentReplyDeleted: 'comments:reply-deleted',
  /** Server → recipient: a new notification (someone mentioned you). */
  notificationCreated: 'notifications:created',
  /** Server → client: the connection was refused or a message was not accepted. */
  error: 'upwell:error',
  /** Server → client, just before it closes the socket: the sign-in ended (signed out everywhere, or expired). */
  sessionEnded: 'upwell:session-ended',
} as const;

/** Payload of `series:version-created`. */
export interface SeriesVersionCreatedEvent {
  groupId: string;
  seriesId: string;
  name: string;
  version: number;
  createdBy: string;
}

/** Payload of `upload:progress`. */
export interface UploadProgressEvent {
  uploadId: string;
  phase: 'parsing' | 'importing' | 'done' | 'failed';
  /** 0..1, or null when the amount of work is not known. */
  fraction: number | null;
  message?: string;
}

/**
 * Payload of every `comments:*` event. It names what changed, not the text:
 * clients fetch the threads again, which the server answers by the reader's role.
 */
export interface CommentChangedEvent {
  notebookId: string;
  threadId: string;
  /** The reply added or deleted, for reply events. */
  replyId: string | null;
  /** Who made the change (user id). */
  by: string;
}

/** Payload of `notifications:created`: the recipient's new unread count and the notification's id. */
export interface NotificationCreatedEvent {
  notificationId: string;
  unread: number;
}

/**
 * How many socket messages one person may send (all their connections on a
 * server process together): a token bucket of `burst` refilled at `perSecond`.
 * Typing sends one update and one caret move per keystroke, so this leaves a
 * fast typist with several tabs far inside it.
 */
export const SOCKET_MESSAGE_LIMIT = { burst: 400, perSecond: 100 } as const;

/** Why the server refused or closed a socket. */
export const SOCKET_CLOSE_REASONS = {
  unauthenticated: 'sign in first: the socket needs a valid token',
  rateLimited: `too many socket messages: at most ${SOCKET_MESSAGE_LIMIT.perSecond} a second (bursts of ${SOCKET_MESSAGE_LIMIT.burst}) per person; this one was not handled, slow down`,
  signedOut: 'you signed out everywhere; sign in again to keep working',
  expired: 'your sign-in has expired; sign in again to keep working',
} as const;

/** Payload of `upwell:error` and `upwell:session-ended`. */
export interface SocketNotice {
  message: string;
}

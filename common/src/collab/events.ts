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
  /** Server → client: the connection was refused or a message was not accepted. */
  error: 'upwell:error',
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

/** Why the server refused or closed a socket. */
export const SOCKET_CLOSE_REASONS = {
  unauthenticated: 'sign in first: the socket needs a valid token',
} as const;

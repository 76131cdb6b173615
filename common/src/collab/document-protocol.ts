/**
 * How a notebook's Yjs document travels over the app's socket. Messages are
 * framed as in the y-protocols reference provider: a varUint message type
 * (sync or awareness) followed by the y-protocols payload, sent as binary in
 * `doc:message` events tagged with the notebook id.
 */
export const DOC_EVENTS = {
  /** Client → server: open a notebook's document; ack `DocJoinAck`. */
  join: 'doc:join',
  /** Client → server: stop following a notebook. */
  leave: 'doc:leave',
  /** Both ways: one framed y-protocols message; client → server messages carrying updates are acked with `DocUpdateAck`. */
  message: 'doc:message',
  /** Server → client: a message was refused (e.g. a reader's edit); nothing of it was applied or passed on. */
  refused: 'doc:refused',
  /** Server → client: your role on the notebook was taken away; the document is closed for you. */
  accessRevoked: 'doc:access-revoked',
} as const;

/** Message types inside `doc:message` (the reference provider's numbering). */
export const DOC_MESSAGE = { sync: 0, awareness: 1 } as const;

/** Body of `doc:join`. */
export interface DocJoinRequest {
  notebookId: string;
  /** The client's EDITOR_SCHEMA_VERSION; older clients are refused so nobody writes nodes others cannot read. */
  schemaVersion: number;
}

/** Ack of `doc:join`. */
export type DocJoinAck = { ok: true; role: string; canEdit: boolean } | { ok: false; error: string };

/** Payload of `doc:message` both ways. */
export interface DocMessage {
  notebookId: string;
  data: Uint8Array;
}

/**
 * Ack of a client's `doc:message`: whether what it carried is now stored,
 * applied and visible to everyone in the room. `resync: true` means the
 * update built on changes the server never received: the server has sent its
 * sync step 1, and the client's step 2 answer carries what was missing.
 */
export type DocUpdateAck = { stored: boolean; error?: string; resync?: boolean };

/** Payload of `doc:refused`; `resync` as in DocUpdateAck. */
export interface DocRefused {
  notebookId: string;
  reason: string;
  resync?: boolean;
}

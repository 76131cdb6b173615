import { z } from 'zod';

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

/** A notebook id as a socket payload carries it (not checked as a uuid: an unknown id gets the same answer as a missing notebook). */
const notebookId = z.string().min(1).max(100);

/** Bytes as socket.io delivers them: a Buffer in Node, an ArrayBuffer or a typed array from browsers. */
const binary = z.custom<ArrayBuffer | ArrayBufferView>((v) => v instanceof ArrayBuffer || ArrayBuffer.isView(v), 'expected binary data');

/** Body of `doc:join`. `schemaVersion`: the client's EDITOR_SCHEMA_VERSION; older clients are refused so nobody writes nodes others cannot read. */
export const docJoinRequestSchema = z.object({ notebookId, schemaVersion: z.number() });
export type DocJoinRequest = z.infer<typeof docJoinRequestSchema>;

/** Body of `doc:leave`. */
export const docLeaveRequestSchema = z.object({ notebookId });
export type DocLeaveRequest = z.infer<typeof docLeaveRequestSchema>;

/** Body of a client's `doc:message`: one framed y-protocols message. */
export const docMessageRequestSchema = z.object({ notebookId, data: binary });

/** The shape each client → server document event needs, as refusals say it. */
export const DOC_PAYLOAD_SHAPES = {
  join: 'doc:join needs { notebookId: string, schemaVersion: number }',
  leave: 'doc:leave needs { notebookId: string }',
  message: 'doc:message needs { notebookId: string, data: binary }',
} as const;

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

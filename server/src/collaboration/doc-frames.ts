import * as decoding from 'lib0/decoding';
import * as encoding from 'lib0/encoding';
import { DOC_MESSAGE } from '@upwell/common';
import * as awarenessProtocol from 'y-protocols/awareness';
import * as syncProtocol from 'y-protocols/sync';
import * as Y from 'yjs';

/** One framed y-protocols message from a client, read but not yet acted on. */
export type DocFrame =
  | { kind: 'sync-step-1'; stateVector: Uint8Array }
  | { kind: 'update'; update: Uint8Array; step: 'sync-step-2' | 'update' }
  | { kind: 'awareness'; update: Uint8Array };

/**
 * Reads the framing of a `doc:message` body (varUint type, then the
 * y-protocols payload) as the reference provider writes it. Throws with a
 * sentence a person can act on when the bytes do not follow it.
 */
export function readDocFrame(data: Uint8Array): DocFrame {
  const decoder = decoding.createDecoder(data);
  const type = decoding.readVarUint(decoder);
  if (type === DOC_MESSAGE.awareness) return { kind: 'awareness', update: decoding.readVarUint8Array(decoder) };
  if (type !== DOC_MESSAGE.sync) throw new Error(`unknown message type ${type}; expected sync (0) or awareness (1)`);
  const step = decoding.readVarUint(decoder);
  const payload = decoding.readVarUint8Array(decoder);
  if (step === syncProtocol.messageYjsSyncStep1) return { kind: 'sync-step-1', stateVector: payload };
  if (step === syncProtocol.messageYjsSyncStep2) return { kind: 'update', update: payload, step: 'sync-step-2' };
  if (step === syncProtocol.messageYjsUpdate) return { kind: 'update', update: payload, step: 'update' };
  throw new Error(`unknown sync message ${step}; expected step 1 (0), step 2 (1) or update (2)`);
}

function frame(type: number, write: (e: encoding.Encoder) => void): Uint8Array {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, type);
  write(encoder);
  return encoding.toUint8Array(encoder);
}

/** Sync step 1: the server's state vector, so the client answers with what the server lacks. */
export const syncStep1Frame = (doc: Y.Doc) => frame(DOC_MESSAGE.sync, (e) => syncProtocol.writeSyncStep1(e, doc));

/** Sync step 2: everything in `doc` the holder of `stateVector` lacks (all of it without one). */
export const syncStep2Frame = (doc: Y.Doc, stateVector?: Uint8Array) =>
  frame(DOC_MESSAGE.sync, (e) => syncProtocol.writeSyncStep2(e, doc, stateVector));

/** An accepted update, passed on to the others in the room. */
export const updateFrame = (update: Uint8Array) => frame(DOC_MESSAGE.sync, (e) => syncProtocol.writeUpdate(e, update));

/** Presence of the given awareness clients (null states tell others they left). */
export const awarenessFrame = (awareness: awarenessProtocol.Awareness, clients: number[]) =>
  frame(DOC_MESSAGE.awareness, (e) => encoding.writeVarUint8Array(e, awarenessProtocol.encodeAwarenessUpdate(awareness, clients)));

/** Bytes of a socket.io binary payload (Buffer in Node, ArrayBuffer or a typed array from browsers), or null. */
export function asBytes(data: unknown): Uint8Array | null {
  if (data instanceof Uint8Array) return data;
  if (data instanceof ArrayBuffer) return new Uint8Array(data);
  if (ArrayBuffer.isView(data)) return new Uint8Array(data.buffer, data.byteOffset, data.byteLength);
  return null;
}

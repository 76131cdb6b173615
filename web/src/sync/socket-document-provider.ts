import * as decoding from 'lib0/decoding';
import * as encoding from 'lib0/encoding';
import type { Socket } from 'socket.io-client';
import * as awarenessProtocol from 'y-protocols/awareness';
import * as syncProtocol from 'y-protocols/sync';
import * as Y from 'yjs';
import {
  DOC_EVENTS,
  DOC_MESSAGE,
  EDITOR_SCHEMA_VERSION,
  SOCKET_EVENTS,
  type DocJoinAck,
  type DocMessage,
  type DocRefused,
  type DocUpdateAck,
  type SocketNotice,
} from '@upwell/common';
import { fromBase64, toBase64 } from './base64';

/** Where the document stands with the server, as the notebook page shows it. */
export type LiveStatus = 'connecting' | 'saved' | 'saving' | 'offline' | 'refused' | 'read-only' | 'closed';

const pendingKey = (notebookId: string) => `upwell.pending.${notebookId}`;

/**
 * Carries one notebook's Yjs document and presence over the app's socket
 * with the y-protocols sync and awareness messages. Local updates wait in a
 * pending list (kept in localStorage) until the server acknowledges that it
 * stored them; after a reconnect the sync handshake sends whatever the server
 * lacks, so offline edits merge by themselves.
 */
export class SocketDocumentProvider {
  readonly awareness: awarenessProtocol.Awareness;
  status: LiveStatus = 'connecting';
  error: string | null = null;
  canEdit = false;
  /** True once the server's copy of the document has arrived (sync step 2). */
  synced = false;
  private pending: Uint8Array[] = [];
  private listeners = new Set<() => void>();
  private joined = false;

  constructor(
    private readonly socket: Socket,
    readonly notebookId: string,
    readonly doc: Y.Doc,
  ) {
    this.awareness = new awarenessProtocol.Awareness(doc);
    const saved = localStorage.getItem(pendingKey(notebookId));
    if (saved) {
      // Edits that never reached the server before a reload: apply them locally; the sync handshake sends them.
      Y.applyUpdate(doc, fromBase64(saved), 'local-pending');
      this.pending.push(fromBase64(saved));
    }
    doc.on('update', this.onDocUpdate);
    this.awareness.on('update', this.onAwarenessUpdate);
    socket.on(DOC_EVENTS.message, this.onMessage);
    socket.on(DOC_EVENTS.refused, this.onRefused);
    socket.on(DOC_EVENTS.accessRevoked, this.onRevoked);
    socket.on(SOCKET_EVENTS.sessionEnded, this.onSessionEnded);
    socket.on('connect', this.join);
    socket.on('disconnect', this.onDisconnect);
    if (socket.connected) this.join();
  }

  /** Calls `fn` whenever the status changes. */
  subscribe(fn: () => void): () => void {
    this.listeners.add(fn);
    return () => this.listeners.delete(fn);
  }

  destroy(): void {
    awarenessProtocol.removeAwarenessStates(this.awareness, [this.doc.clientID], 'local');
    this.socket.emit(DOC_EVENTS.leave, { notebookId: this.notebookId });
    this.doc.off('update', this.onDocUpdate);
    this.awareness.off('update', this.onAwarenessUpdate);
    this.socket.off(DOC_EVENTS.message, this.onMessage);
    this.socket.off(DOC_EVENTS.refused, this.onRefused);
    this.socket.off(DOC_EVENTS.accessRevoked, this.onRevoked);
    this.socket.off(SOCKET_EVENTS.sessionEnded, this.onSessionEnded);
    this.socket.off('connect', this.join);
    this.socket.off('disconnect', this.onDisconnect);
    this.awareness.destroy();
  }

  private set(status: LiveStatus, error: string | null = this.error): void {
    this.status = status;
    this.error = error;
    this.listeners.forEach((fn) => fn());
  }

  private send(data: Uint8Array, ack?: (a: DocUpdateAck) => void): void {
    const msg: DocMessage = { notebookId: this.notebookId, data };
    if (ack) this.socket.timeout(15_000).emit(DOC_EVENTS.message, msg, (err: unknown, a: DocUpdateAck) => ack(err ? { stored: false, error: 'no answer from the server' } : a));
    else this.socket.emit(DOC_EVENTS.message, msg);
  }

  private join = (): void => {
    this.set('connecting');
    this.socket.emit(DOC_EVENTS.join, { notebookId: this.notebookId, schemaVersion: EDITOR_SCHEMA_VERSION }, (ack: DocJoinAck) => {
      if (!ack.ok) return this.set('refused', ack.error);
      this.joined = true;
      this.canEdit = ack.canEdit;
      const encoder = encoding.createEncoder();
      encoding.writeVarUint(encoder, DOC_MESSAGE.sync);
      syncProtocol.writeSyncStep1(encoder, this.doc);
      this.send(encoding.toUint8Array(encoder));
      if (this.awareness.getLocalState()) this.onAwarenessUpdate({ added: [this.doc.clientID], updated: [], removed: [] });
      this.set(ack.canEdit ? (this.pending.length ? 'saving' : 'saved') : 'read-only');
    });
  };

  private onDisconnect = (): void => {
    this.joined = false;
    // The server closed the socket because the sign-in ended: that stays the message, not "offline".
    if (this.status !== 'closed') this.set('offline');
  };

  /** The server is about to close the socket: signed out everywhere, or the sign-in expired. Unsent edits stay in localStorage. */
  private onSessionEnded = (notice: SocketNotice): void => {
    this.joined = false;
    this.set('closed', notice.message);
  };

  private onMessage = (msg: DocMessage): void => {
    if (msg.notebookId !== this.notebookId) return;
    const decoder = decoding.createDecoder(new Uint8Array(msg.data));
    const type = decoding.readVarUint(decoder);
    if (type === DOC_MESSAGE.sync) {
      const encoder = encoding.createEncoder();
      encoding.writeVarUint(encoder, DOC_MESSAGE.sync);
      const kind = syncProtocol.readSyncMessage(decoder, encoder, this.doc, this);
      if (kind === syncProtocol.messageYjsSyncStep2 && !this.synced) {
        this.synced = true;
        this.listeners.forEach((fn) => fn());
      }
      // Our answer to the server's step 1 carries what it lacks, offline edits included: it is acked like an update.
      if (encoding.length(encoder) > 1) {
        if (kind === syncProtocol.messageYjsSyncStep1 && this.canEdit) this.sendTracked(encoding.toUint8Array(encoder), this.pending.length);
        else if (kind === syncProtocol.messageYjsSyncStep1) this.send(encoding.toUint8Array(encoder));
      }
    } else if (type === DOC_MESSAGE.awareness) {
      awarenessProtocol.applyAwarenessUpdate(this.awareness, decoding.readVarUint8Array(decoder), this);
    }
  };

  private onDocUpdate = (update: Uint8Array, origin: unknown): void => {
    if (origin === this || origin === 'local-pending') return;
    this.pending.push(update);
    this.persistPending();
    if (!this.joined || !this.canEdit) return;
    const encoder = encoding.createEncoder();
    encoding.writeVarUint(encoder, DOC_MESSAGE.sync);
    syncProtocol.writeUpdate(encoder, update);
    this.sendTracked(encoding.toUint8Array(encoder), this.pending.length);
  };

  /** Sends a message carrying updates; once stored, the first `upTo` pending updates are done. */
  private sendTracked(data: Uint8Array, upTo: number): void {
    this.set('saving');
    this.send(data, (ack) => {
      if (ack.stored) {
        this.pending = this.pending.slice(upTo);
        this.persistPending();
        if (!this.pending.length && this.status === 'saving') this.set('saved', null);
      } else if (!ack.resync) this.set('refused', ack.error ?? 'the server did not store the change');
      // resync: the server asked for what it lacks (sync step 1); our step 2 answer carries these edits again.
    });
  }

  private onAwarenessUpdate = ({ added, updated, removed }: { added: number[]; updated: number[]; removed: number[] }, origin?: unknown): void => {
    if (origin === this || !this.joined) return;
    const changed = added.concat(updated, removed);
    const encoder = encoding.createEncoder();
    encoding.writeVarUint(encoder, DOC_MESSAGE.awareness);
    encoding.writeVarUint8Array(encoder, awarenessProtocol.encodeAwarenessUpdate(this.awareness, changed));
    this.send(encoding.toUint8Array(encoder));
  };

  private onRefused = (r: DocRefused): void => {
    if (r.notebookId === this.notebookId && !r.resync) this.set('refused', r.reason);
  };

  private onRevoked = (r: { notebookId: string }): void => {
    if (r.notebookId !== this.notebookId) return;
    this.joined = false;
    this.set('closed', 'your access to this notebook was removed');
  };

  private persistPending(): void {
    if (this.pending.length) localStorage.setItem(pendingKey(this.notebookId), toBase64(Y.mergeUpdates(this.pending)));
    else localStorage.removeItem(pendingKey(this.notebookId));
  }
}

import * as decoding from 'lib0/decoding';
import * as encoding from 'lib0/encoding';
import * as syncProtocol from 'y-protocols/sync';
import * as Y from 'yjs';
import { describe, expect, it } from 'vitest';
import type { Socket } from 'socket.io-client';
import { DOC_EVENTS, DOC_MESSAGE, DOCUMENT_FIELD, SOCKET_CLOSE_REASONS, SOCKET_EVENTS, type DocUpdateAck } from '@upwell/common';
import { SocketDocumentProvider } from './socket-document-provider';

type Handler = (...args: unknown[]) => void;

/** A stand-in for the app's socket.io connection: records what the provider sends, lets the test play the server. */
class FakeSocket {
  connected = true;
  readonly handlers = new Map<string, Set<Handler>>();
  readonly sent: { event: string; body: unknown; ack?: Handler }[] = [];
  on(event: string, fn: Handler) {
    if (!this.handlers.has(event)) this.handlers.set(event, new Set());
    this.handlers.get(event)!.add(fn);
    return this;
  }
  off(event: string, fn: Handler) {
    this.handlers.get(event)?.delete(fn);
    return this;
  }
  emit(event: string, body: unknown, ack?: Handler) {
    this.sent.push({ event, body, ack });
    if (event === DOC_EVENTS.join) ack?.({ ok: true, role: 'co-author', canEdit: true });
    return this;
  }
  timeout() {
    return { emit: (event: string, body: unknown, ack: (err: unknown, a: unknown) => void) => this.emit(event, body, (a) => ack(null, a)) };
  }
  /** The server sends an event to this client. */
  serverSends(event: string, payload: unknown) {
    for (const fn of this.handlers.get(event) ?? []) fn(payload);
  }
}

const syncFrame = (write: (e: encoding.Encoder) => void) => {
  const e = encoding.createEncoder();
  encoding.writeVarUint(e, DOC_MESSAGE.sync);
  write(e);
  return encoding.toUint8Array(e);
};

function open(notebookId: string) {
  localStorage.clear();
  const socket = new FakeSocket();
  const doc = new Y.Doc();
  const provider = new SocketDocumentProvider(socket as unknown as Socket, notebookId, doc);
  return { socket, doc, provider };
}

describe('SocketDocumentProvider', () => {
  it('shows why the server closed the socket when the sign-in ended, rather than "offline"', () => {
    const { socket, provider } = open('nb-1');
    expect(provider.status).toBe('saved');
    socket.serverSends(SOCKET_EVENTS.sessionEnded, { message: SOCKET_CLOSE_REASONS.signedOut });
    socket.serverSends('disconnect', 'io server disconnect');
    expect(provider.status).toBe('closed');
    expect(provider.error).toBe(SOCKET_CLOSE_REASONS.signedOut);
  });

  it('keeps an edit refused for missing dependencies pending, answers the server’s step 1 with it, and is saved once stored', () => {
    const { socket, doc, provider } = open('nb-2');
    const frag = doc.getXmlFragment(DOCUMENT_FIELD);
    frag.insert(0, [new Y.XmlElement('paragraph')]);
    const update = socket.sent.filter((s) => s.event === DOC_EVENTS.message).at(-1)!;
    update.ack!({ stored: false, error: 'builds on changes the server never received', resync: true } satisfies DocUpdateAck);
    socket.serverSends(DOC_EVENTS.refused, { notebookId: 'nb-2', reason: 'builds on changes the server never received', resync: true });
    expect(provider.status).toBe('saving');
    // The server asks with its (empty) state vector; the provider's step 2 answer carries the edit again.
    socket.serverSends(DOC_EVENTS.message, { notebookId: 'nb-2', data: syncFrame((e) => syncProtocol.writeSyncStep1(e, new Y.Doc())) });
    const answer = socket.sent.at(-1)!;
    const d = decoding.createDecoder((answer.body as { data: Uint8Array }).data);
    expect([decoding.readVarUint(d), decoding.readVarUint(d)]).toEqual([DOC_MESSAGE.sync, syncProtocol.messageYjsSyncStep2]);
    const server = new Y.Doc();
    Y.applyUpdate(server, decoding.readVarUint8Array(d));
    expect(server.getXmlFragment(DOCUMENT_FIELD).length).toBe(1);
    answer.ack!({ stored: true });
    expect(provider.status).toBe('saved');
    expect(localStorage.getItem('upwell.pending.nb-2')).toBeNull();
  });
});

import * as decoding from 'lib0/decoding';
import * as encoding from 'lib0/encoding';
import type { Socket } from 'socket.io-client';
import * as awarenessProtocol from 'y-protocols/awareness';
import * as syncProtocol from 'y-protocols/sync';
import * as Y from 'yjs';
import {
  DOC_EVENTS,
  DOC_MESSAGE,
  DOCUMENT_FIELD,
  EDITOR_SCHEMA_VERSION,
  type DocJoinAck,
  type DocMessage,
  type DocRefused,
  type DocUpdateAck,
} from '@upwell/common';
import { connectSocket, eventually } from './socket-client';

/** What the server sends us, marked so local edits can be told from remote ones. */
const FROM_SERVER = 'server';

/**
 * A co-editing client as a browser editor would run it: a Y.Doc synced over
 * the app socket with y-protocols framing, sending its own edits as updates.
 */
export class DocClient {
  readonly doc = new Y.Doc();
  readonly awareness = new awarenessProtocol.Awareness(this.doc);
  readonly refused: DocRefused[] = [];
  readonly revoked: DocRefused[] = [];
  /** Acks of every update this client sent, in sending order. */
  readonly acks: Promise<DocUpdateAck>[] = [];
  /** Updates received from the server (after the initial sync). */
  received = 0;
  synced = false;
  notebookId = '';

  private constructor(readonly socket: Socket) {
    socket.on(DOC_EVENTS.message, (m: DocMessage) => this.onMessage(m));
    socket.on(DOC_EVENTS.refused, (r: DocRefused) => this.refused.push(r));
    socket.on(DOC_EVENTS.accessRevoked, (r: DocRefused) => this.revoked.push(r));
    this.doc.on('update', (update: Uint8Array, origin: unknown) => {
      if (origin !== FROM_SERVER && this.notebookId) this.acks.push(this.sendSync(syncProtocol.messageYjsUpdate, update));
    });
    this.awareness.on('update', ({ added, updated, removed }: Record<string, number[]>, origin: unknown) => {
      if (origin === FROM_SERVER || !this.notebookId) return;
      const changed = [...added, ...updated, ...removed];
      const e = encoding.createEncoder();
      encoding.writeVarUint(e, DOC_MESSAGE.awareness);
      encoding.writeVarUint8Array(e, awarenessProtocol.encodeAwarenessUpdate(this.awareness, changed));
      this.send(encoding.toUint8Array(e)).catch(() => undefined);
    });
  }

  /** Connects with a person's token (null: no token). */
  static async connect(url: string, token: string | null): Promise<DocClient> {
    return new DocClient(await connectSocket(url, token));
  }

  /** Joins a notebook and, when accepted, waits for the server's sync step 2. */
  async join(notebookId: string, schemaVersion = EDITOR_SCHEMA_VERSION): Promise<DocJoinAck> {
    const ack = await this.socket.timeout(5000).emitWithAck(DOC_EVENTS.join, { notebookId, schemaVersion });
    if ((ack as DocJoinAck).ok) {
      this.notebookId = notebookId;
      await eventually(() => this.synced, 5000, 'sync step 2 from the server');
    }
    return ack as DocJoinAck;
  }

  /** Sends raw bytes (or anything) as a doc:message and resolves with the ack. */
  send(data: unknown, notebookId = this.notebookId): Promise<DocUpdateAck> {
    return this.socket.timeout(10_000).emitWithAck(DOC_EVENTS.message, { notebookId, data }) as Promise<DocUpdateAck>;
  }

  /** Appends a paragraph as an editor would; the update goes out at once. Resolves with its ack. */
  addParagraph(text: string): Promise<DocUpdateAck> {
    const before = this.acks.length;
    const frag = this.doc.getXmlFragment(DOCUMENT_FIELD);
    const p = new Y.XmlElement('paragraph');
    p.insert(0, [new Y.XmlText(text)]);
    frag.insert(frag.length, [p]);
    return this.acks[before];
  }

  /** Plain text of each top-level node. */
  texts(): string[] {
    return textsOf(this.doc);
  }

  close(): void {
    this.awareness.destroy();
    this.socket.disconnect();
  }

  private sendSync(step: number, payload: Uint8Array): Promise<DocUpdateAck> {
    const e = encoding.createEncoder();
    encoding.writeVarUint(e, DOC_MESSAGE.sync);
    encoding.writeVarUint(e, step);
    encoding.writeVarUint8Array(e, payload);
    return this.send(encoding.toUint8Array(e));
  }

  private onMessage(m: DocMessage): void {
    const decoder = decoding.createDecoder(new Uint8Array(m.data));
    const type = decoding.readVarUint(decoder);
    if (type === DOC_MESSAGE.awareness) {
      awarenessProtocol.applyAwarenessUpdate(this.awareness, decoding.readVarUint8Array(decoder), FROM_SERVER);
      return;
    }
    const reply = encoding.createEncoder();
    encoding.writeVarUint(reply, DOC_MESSAGE.sync);
    const kind = syncProtocol.readSyncMessage(decoder, reply, this.doc, FROM_SERVER);
    if (kind === syncProtocol.messageYjsSyncStep2) this.synced = true;
    if (kind === syncProtocol.messageYjsUpdate) this.received += 1;
    // Answer the server's step 1 with what it lacks, as the reference provider does.
    if (encoding.length(reply) > 1) this.send(encoding.toUint8Array(reply), m.notebookId).catch(() => undefined);
  }
}

/** Plain text of each top-level node of a document. */
export function textsOf(doc: Y.Doc): string[] {
  return doc
    .getXmlFragment(DOCUMENT_FIELD)
    .toArray()
    .map((n) => (n instanceof Y.XmlElement ? n.toArray().map((t) => t.toString()).join('') : ''));
}

/** The document as the server has stored it (GET /document). */
export async function storedDoc(url: string, token: string, notebookId: string): Promise<Y.Doc> {
  const res = await fetch(`${url}/api/notebooks/${notebookId}/document`, { headers: { Authorization: `Bearer ${token}` } });
  if (!res.ok) throw new Error(`GET document answered ${res.status}`);
  const body = (await res.json()) as { state: string };
  const doc = new Y.Doc();
  Y.applyUpdate(doc, Buffer.from(body.state, 'base64'));
  return doc;
}

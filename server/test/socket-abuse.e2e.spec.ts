import { randomBytes, randomUUID } from 'node:crypto';
import request from 'supertest';
import * as encoding from 'lib0/encoding';
import * as syncProtocol from 'y-protocols/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DOC_EVENTS, DOC_MESSAGE, EDITOR_SCHEMA_VERSION, SOCKET_EVENTS } from '@upwell/common';
import { DocClient, storedDoc, textsOf } from './collab-client';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';
import { startTestApp, type TestApp } from './test-app';

/** A sync-protocol frame (y-protocols message type 0, sub-type `step`) around `payload`. */
function syncFrame(step: number, payload: Uint8Array): Uint8Array {
  const enc = encoding.createEncoder();
  encoding.writeVarUint(enc, DOC_MESSAGE.sync);
  encoding.writeVarUint(enc, step);
  encoding.writeVarUint8Array(enc, payload);
  return encoding.toUint8Array(enc);
}

function deepObject(n: number): unknown {
  let v: unknown = 1;
  for (let i = 0; i < n; i++) v = { notebookId: v };
  return v;
}

/** Garbage for any event; `nb` is a notebook the sender may or may not have a role on. */
function garbage(nb: string): [string, unknown][] {
  return [
    ['null', null],
    ['a string', 'doc'],
    ['a number', 42],
    ['true', true],
    ['an empty array', []],
    ['a huge array', Array.from({ length: 100_000 }, (_, i) => i)],
    ['a 1000-deep object', deepObject(1000)],
    ['notebookId of the wrong type', { notebookId: 123, schemaVersion: 'new', data: 'x' }],
    ['notebookId not an id', { notebookId: '../../etc/passwd', schemaVersion: EDITOR_SCHEMA_VERSION, data: new Uint8Array([0, 0]) }],
    ['a 1 MB notebookId', { notebookId: 'n'.repeat(1024 * 1024), schemaVersion: EDITOR_SCHEMA_VERSION }],
    ['an unknown notebook', { notebookId: randomUUID(), schemaVersion: EDITOR_SCHEMA_VERSION, data: syncFrame(2, new Uint8Array([0, 0])) }],
    ['schemaVersion NaN-ish', { notebookId: nb, schemaVersion: Number.NaN }],
    ['schemaVersion huge', { notebookId: nb, schemaVersion: 1e308, data: 'not bytes' }],
    ['data as a string', { notebookId: nb, data: 'AAEC' }],
    ['data as a number array', { notebookId: nb, data: [0, 2, 3, 1, 2] }],
    ['data as a fake typed array', { notebookId: nb, data: { length: 1e9, 0: 0 } }],
    ['data as random bytes', { notebookId: nb, data: randomBytes(4096) }],
    ['data as an empty buffer', { notebookId: nb, data: Buffer.alloc(0) }],
    ['an update frame of garbage', { notebookId: nb, data: syncFrame(2, randomBytes(512)) }],
    ['an update frame claiming a huge length', { notebookId: nb, data: Buffer.from([0, 2, 0xff, 0xff, 0xff, 0xff, 0x0f, 1, 2]) }],
    ['an awareness frame of garbage', { notebookId: nb, data: Buffer.concat([Buffer.from([1]), randomBytes(64)]) }],
    ['an unknown message type', { notebookId: nb, data: Buffer.from([9, 9, 9]) }],
    ['4 MB of zeros', { notebookId: nb, data: Buffer.alloc(4 * 1024 * 1024) }],
  ];
}

/** Every event name the app knows, both directions: a client sending a server-only event must be ignored too. */
const EVENT_NAMES = [...Object.values(DOC_EVENTS), ...Object.values(SOCKET_EVENTS)];
/** Events the server answers with an ack; to the others it answers nothing, so a short wait tells silence. */
const ACKED: string[] = [DOC_EVENTS.join, DOC_EVENTS.message];

describe('socket events with malformed payloads', () => {
  let t: TestApp;
  let lead: TestUser, reader: TestUser, outsider: TestUser;
  let notebookId: string;

  beforeAll(async () => {
    t = await startTestApp();
    [lead, reader, outsider] = await Promise.all([buildUser(t.url, 'Lead'), buildUser(t.url, 'Reader'), buildUser(t.url, 'Outsider')]);
    const group = await buildGroup(t.url, lead, [reader]);
    await buildGroup(t.url, outsider, [], 'Other group');
    notebookId = (await buildNotebook(t.url, group.id, lead, [[reader, 'reader']], 'Garbage in, nothing stored')).id;
    const seed = await DocClient.connect(t.url, lead.accessToken);
    await seed.join(notebookId);
    expect(await seed.addParagraph('before the garbage')).toEqual({ stored: true });
    seed.close();
  });
  afterAll(() => t.close());

  for (const who of ['lead', 'reader', 'outsider'] as const) {
    it(`as ${who}: every event with every garbage payload is refused or ignored; the server, the socket and the document are unharmed`, async () => {
      const person = { lead, reader, outsider }[who];
      const before = textsOf(await storedDoc(t.url, lead.accessToken, notebookId));
      const c = await DocClient.connect(t.url, person.accessToken);
      const errors: unknown[] = [];
      c.socket.on(SOCKET_EVENTS.error, (e) => errors.push(e));
      // The lead author has joined, so garbage reaches the message handler past the membership check.
      if (who === 'lead') expect((await c.join(notebookId)).ok).toBe(true);
      const answers: string[] = [];
      for (const event of EVENT_NAMES) {
        for (const [what, payload] of garbage(notebookId)) {
          // An ack (a refusal) or silence: both are fine; a dropped connection or a crash is not.
          const ack = await c.socket.timeout(ACKED.includes(event) ? 5000 : 50).emitWithAck(event, payload).then(
            (a: unknown) => a,
            () => 'no answer',
          );
          if (ACKED.includes(event) && ack === 'no answer') answers.push(`${event} with ${what} got no ack`);
          if (ack && typeof ack === 'object' && ((ack as { ok?: boolean }).ok === true || (ack as { stored?: boolean }).stored === true)) {
            answers.push(`${event} with ${what} was accepted: ${JSON.stringify(ack)}`);
          }
          expect(c.socket.connected, `${event} with ${what} dropped the socket`).toBe(true);
        }
        // Garbage with no ack callback at all.
        c.socket.emit(event, 'no ack wanted');
        c.socket.emit(event);
      }
      expect(answers).toEqual([]);
      expect(errors).toEqual([]);
      await request(t.url).get('/api/health').expect(200);
      // Nothing of it was stored.
      expect(textsOf(await storedDoc(t.url, lead.accessToken, notebookId))).toEqual(before);
      // The same socket still works for what this person may do.
      const joined = await c.join(notebookId);
      if (who === 'outsider') {
        expect(joined).toEqual({ ok: false, error: expect.stringContaining('no such notebook') });
        const sent = await c.send(syncFrame(2, new Uint8Array([0, 0])), notebookId);
        expect(sent.stored).toBe(false);
      } else {
        expect(joined.ok).toBe(true);
        const edit = await c.addParagraph(`after the garbage, by ${who}`);
        expect(edit.stored).toBe(who === 'lead');
      }
      c.close();
      const after = textsOf(await storedDoc(t.url, lead.accessToken, notebookId));
      expect(after).toEqual(who === 'lead' ? [...before, 'after the garbage, by lead'] : before);
    }, 180_000);
  }
});

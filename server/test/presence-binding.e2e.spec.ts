import * as encoding from 'lib0/encoding';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DOC_MESSAGE, PRESENCE_LIMITS, presenceColour, type DocRefused } from '@upwell/common';
import { DocClient } from './collab-client';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';
import { eventually } from './socket-client';
import { startTestApp, type TestApp } from './test-app';

/**
 * An awareness frame written by hand in the y-protocols wire format (message
 * type 1, then count and per entry client id, clock and JSON state), so the
 * test says exactly what a hostile client puts on the wire.
 */
function awarenessFrame(entries: { clientId: number; clock: number; state: unknown }[]): Uint8Array {
  const inner = encoding.createEncoder();
  encoding.writeVarUint(inner, entries.length);
  for (const e of entries) {
    encoding.writeVarUint(inner, e.clientId);
    encoding.writeVarUint(inner, e.clock);
    encoding.writeVarString(inner, JSON.stringify(e.state));
  }
  const outer = encoding.createEncoder();
  encoding.writeVarUint(outer, DOC_MESSAGE.awareness);
  encoding.writeVarUint8Array(outer, encoding.toUint8Array(inner));
  return encoding.toUint8Array(outer);
}

const caret = { anchor: { type: { client: 1, clock: 0 }, assoc: 0 }, head: { type: { client: 1, clock: 0 }, assoc: 0 } };

describe('presence is bound to the signed-in person (issue 22 item 1, issue 23 item 7)', () => {
  let t: TestApp;
  let lead: TestUser, reader: TestUser, coauthor: TestUser;
  let notebookId: string;
  const open: DocClient[] = [];
  const client = async (who: TestUser) => {
    const c = await DocClient.connect(t.url, who.accessToken);
    open.push(c);
    await c.join(notebookId);
    return c;
  };
  /** Every presence state the observer holds, as JSON text, to search for what must never appear. */
  const everyState = (c: DocClient) => JSON.stringify([...c.awareness.getStates().values()]);

  beforeAll(async () => {
    t = await startTestApp();
    [lead, reader, coauthor] = await Promise.all([buildUser(t.url, 'Lead'), buildUser(t.url, 'Reader'), buildUser(t.url, 'Coauthor')]);
    const group = await buildGroup(t.url, lead, [reader, coauthor]);
    notebookId = (await buildNotebook(t.url, group.id, lead, [[reader, 'reader'], [coauthor, 'co-author']], 'Who is really here')).id;
  });
  afterAll(async () => {
    for (const c of open) c.close();
    await t.close();
  });

  it('shows the server’s name, id and colour of the sender whatever name, id and colour the client sends', async () => {
    const [leadClient, readerClient] = [await client(lead), await client(reader)];
    const spoof = { user: { id: lead.user.id, name: 'Professor Spoofed', color: '#000000' }, cursor: caret, role: 'lead-author' };
    const ack = await readerClient.send(awarenessFrame([{ clientId: readerClient.doc.clientID, clock: 1, state: spoof }]));
    expect(ack.stored).toBe(false); // presence is never stored; it was not refused either:
    expect(readerClient.refused).toEqual([]);
    await eventually(() => leadClient.awareness.getStates().has(readerClient.doc.clientID), 2000, 'the reader’s presence at the lead');
    expect(leadClient.awareness.getStates().get(readerClient.doc.clientID)).toEqual({
      user: { id: reader.user.id, name: reader.user.name, color: presenceColour(reader.user.id) },
      cursor: caret,
    });
    // A late joiner gets the same bound state from the room.
    const late = await client(coauthor);
    await eventually(() => late.awareness.getStates().has(readerClient.doc.clientID), 2000, 'the reader’s presence at a late joiner');
    expect(late.awareness.getStates().get(readerClient.doc.clientID)?.user.name).toBe(reader.user.name);
    for (const c of [leadClient, late]) expect(everyState(c)).not.toContain('Professor Spoofed');
  });

  it('refuses setting or removing the presence of a client id another connection announced, and keeps theirs', async () => {
    const [leadClient, readerClient, observer] = [await client(lead), await client(reader), await client(coauthor)];
    leadClient.awareness.setLocalStateField('cursor', caret);
    const leadId = leadClient.doc.clientID;
    await eventually(() => observer.awareness.getStates().get(leadId)?.user?.name === lead.user.name, 2000, 'the lead’s presence at the observer');
    const takeOver = await readerClient.send(awarenessFrame([{ clientId: leadId, clock: 99, state: { cursor: null, user: { name: 'hijacked' } } }]));
    expect(takeOver).toEqual({ stored: false, error: expect.stringContaining('belongs to another connection') });
    const remove = await readerClient.send(awarenessFrame([{ clientId: leadId, clock: 100, state: null }]));
    expect(remove).toEqual({ stored: false, error: expect.stringContaining('belongs to another connection') });
    expect(readerClient.refused.map((r: DocRefused) => r.reason)).toHaveLength(2);
    await new Promise((r) => setTimeout(r, 200));
    expect(observer.awareness.getStates().get(leadId)?.user).toEqual({ id: lead.user.id, name: lead.user.name, color: presenceColour(lead.user.id) });
    expect(everyState(observer)).not.toContain('hijacked');
  });

  it('refuses an oversized state, more client ids than one connection may hold, and 2,000 fake presences in one message', async () => {
    const [readerClient, observer] = [await client(reader), await client(coauthor)];
    const big = await readerClient.send(
      awarenessFrame([{ clientId: readerClient.doc.clientID, clock: 1, state: { editingFigure: null, padding: 'x'.repeat(PRESENCE_LIMITS.updateMaxBytes) } }]),
    );
    expect(big.error).toMatch(/at most 4096 bytes/);
    const fakes = Array.from({ length: 2000 }, (_, i) => ({ clientId: 1_000_000 + i, clock: 1, state: {} }));
    expect((await readerClient.send(awarenessFrame(fakes))).error).toMatch(/at most 4096 bytes/);
    expect((await readerClient.send(awarenessFrame(fakes.slice(0, 3)))).error).toMatch(/at most 2 presence clients; this update held 3/);
    // One by one: the third new id of this connection is refused.
    for (const id of [2_000_001, 2_000_002]) expect((await readerClient.send(awarenessFrame([{ clientId: id, clock: 1, state: {} }]))).error).toBeUndefined();
    expect((await readerClient.send(awarenessFrame([{ clientId: 2_000_003, clock: 1, state: {} }]))).error).toMatch(/at most 2 presence clients/);
    const badCaret = await readerClient.send(awarenessFrame([{ clientId: 2_000_001, clock: 2, state: { cursor: { anchor: 'everywhere' } } }]));
    expect(badCaret.error).toMatch(/presence state was refused: cursor/);
    await new Promise((r) => setTimeout(r, 200));
    const fakeIds = [...observer.awareness.getStates().keys()].filter((id) => id >= 1_000_000 && id < 2_000_000);
    expect(fakeIds).toEqual([]);
    // A late joiner receives a few hundred bytes of presence, not megabytes.
    const late = await client(lead);
    expect(JSON.stringify([...late.awareness.getStates().values()]).length).toBeLessThan(4096);
    // The socket still works: presence of an id it holds goes through.
    expect((await readerClient.send(awarenessFrame([{ clientId: 2_000_002, clock: 2, state: { cursor: caret } }]))).error).toBeUndefined();
    await eventually(() => observer.awareness.getStates().get(2_000_002)?.cursor !== undefined, 2000, 'the reader’s caret');
  });

  it('removes a leaving connection’s presence, also the ids it announced by hand', async () => {
    const [readerClient, observer] = [await client(reader), await client(coauthor)];
    await readerClient.send(awarenessFrame([{ clientId: 3_000_001, clock: 1, state: { cursor: caret } }]));
    await eventually(() => observer.awareness.getStates().has(3_000_001), 2000, 'the hand-made presence');
    readerClient.close();
    await eventually(() => !observer.awareness.getStates().has(3_000_001), 2000, 'the presence gone');
  });
});

import type { ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { MAIN, startServer } from './child-server';
import { DocClient, storedDoc, textsOf } from './collab-client';
import { buildGroup, buildNotebook, buildUser } from './factories';
import { eventually } from './socket-client';

describe('a server killed mid-stream keeps every acknowledged edit', () => {
  const dataDir = mkdtempSync(join(tmpdir(), 'upwell-collab-fault-'));
  const children: ChildProcess[] = [];
  afterAll(() => {
    for (const c of children) if (c.exitCode === null && c.signalCode === null) c.kill('SIGTERM');
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('SIGKILL while a client streams edits, restart on the same data: every acked edit is there once', async () => {
    expect(existsSync(MAIN), `${MAIN} is missing: build the server first (npm test does)`).toBe(true);
    const first = await startServer(dataDir);
    children.push(first.child);
    const lead = await buildUser(first.url, 'Lead');
    const group = await buildGroup(first.url, lead);
    const notebookId = (await buildNotebook(first.url, group.id, lead, [], 'Stored before acknowledged')).id;
    const c = await DocClient.connect(first.url, lead.accessToken);
    await c.join(notebookId);

    const acked = new Set<number>();
    let sent = 0;
    let killed = false;
    const exited = new Promise((r) => first.child.once('exit', r));
    // Several edits in flight at once, as a fast typist's editor has; well past two compactions (every 50 updates).
    while (!killed && sent < 2000) {
      const i = sent++;
      c.addParagraph(`edit ${i}`).then(
        (ack) => ack.stored && acked.add(i),
        () => undefined, // in flight when the server died: never acknowledged
      );
      if (acked.size >= 130 && !killed) {
        first.child.kill('SIGKILL');
        killed = true;
      }
      await new Promise((r) => setTimeout(r, 3));
    }
    await exited;
    c.close();
    expect(killed).toBe(true);
    const ackedAtKill = [...acked];
    expect(sent).toBeGreaterThan(ackedAtKill.length); // some were still in flight: the kill was mid-stream

    const second = await startServer(dataDir);
    children.push(second.child);
    const texts = textsOf(await storedDoc(second.url, lead.accessToken, notebookId));
    const edits = texts.filter((s) => s.startsWith('edit '));
    for (const i of ackedAtKill) expect(edits, `acknowledged edit ${i} is missing after restart`).toContain(`edit ${i}`);
    expect(new Set(edits).size).toBe(edits.length);

    // A client joining the restarted server gets the same document over the socket.
    const again = await DocClient.connect(second.url, lead.accessToken);
    await again.join(notebookId);
    await eventually(() => again.texts().length === texts.length, 3000, 'the joiner to hold the stored document');
    expect(again.texts()).toEqual(texts);
    expect(await again.addParagraph('after the restart')).toEqual({ stored: true });
    again.close();
    second.child.kill('SIGTERM');
  });
});

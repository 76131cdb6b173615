import { EntityManager } from '@mikro-orm/sqlite';
import { BadRequestException, Injectable } from '@nestjs/common';
import type { Socket } from 'socket.io';
import * as Y from 'yjs';
import { DocumentsService } from '../documents/documents.service';
import { updateFrame } from './doc-frames';
import { DocumentBroadcast } from './document-broadcast';
import type { DocumentRoom, PendingWrite } from './document-room';

/**
 * Takes accepted updates through their three steps, in this order: store
 * (DocumentsService.append writes to SQLite before returning), apply to the
 * room's doc, pass on. Nobody hears of, or is acked for, an edit a crash
 * could lose.
 *
 * A room stores one batch at a time: updates arriving while a batch is being
 * written wait and go into the next one as a single merged update, so a busy
 * room costs one append per round trip to disk rather than one per keystroke.
 */
@Injectable()
export class DocumentWriter {
  constructor(
    private readonly em: EntityManager,
    private readonly documents: DocumentsService,
    private readonly broadcast: DocumentBroadcast,
  ) {}

  /** Whether the update holds anything the room's document lacks (a client's sync step 2 often holds nothing). */
  carriesNews(room: DocumentRoom, update: Uint8Array): boolean {
    try {
      return !Y.snapshotContainsUpdate(Y.snapshot(room.doc), update);
    } catch {
      // Unreadable: let append refuse it with its own explanation.
      return true;
    }
  }

  /**
   * Stores and spreads one update; resolves once it is stored, applied and
   * sent. `sender` is left out of the broadcast; without one (a restore)
   * everyone in the room gets it. Rejects with append's BadRequestException
   * when the update breaks the document or cannot be read.
   */
  write(room: DocumentRoom, update: Uint8Array, authorId: string | null, sender?: Socket): Promise<void> {
    return new Promise((resolve, reject) => {
      room.pendingWrites.push({ update, authorId, sender, done: (err) => (err ? reject(err) : resolve()) });
      if (!room.writing) void this.drain(room);
    });
  }

  private async drain(room: DocumentRoom): Promise<void> {
    room.writing = true;
    try {
      while (room.pendingWrites.length) {
        const batch = room.pendingWrites.splice(0);
        const stored = await this.store(room, batch);
        for (const [i, w] of batch.entries()) {
          if (stored[i] !== true) {
            w.done(stored[i]);
            continue;
          }
          Y.applyUpdate(room.doc, w.update, w.sender?.id ?? 'server');
          this.broadcast.toRoom(room.notebookId, updateFrame(w.update), w.sender);
          w.done();
        }
      }
    } finally {
      room.writing = false;
    }
  }

  /** Appends the batch as one merged update; if that is refused, each on its own so one bad update refuses only itself. */
  private async store(room: DocumentRoom, batch: PendingWrite[]): Promise<(true | unknown)[]> {
    // Each append gets its own EntityManager: socket handlers have no request context. The room's
    // doc holds exactly what is stored, so the update is checked against it rather than a reload.
    const append = (update: Uint8Array, author: string | null) => this.documents.append(room.notebookId, update, author, this.em.fork(), room.doc);
    if (batch.length > 1) {
      const authors = new Set(batch.map((w) => w.authorId));
      try {
        // A batch of several people's edits is stored without one author.
        await append(Y.mergeUpdates(batch.map((w) => w.update)), authors.size === 1 ? batch[0].authorId : null);
        return batch.map(() => true);
      } catch (err) {
        if (!(err instanceof BadRequestException)) return batch.map(() => err);
      }
    }
    // One by one, each checked against the room's document plus the ones before it that were stored (a client's
    // second update builds on its first), not the room's document alone.
    const running = new Y.Doc({ gc: true });
    Y.applyUpdate(running, Y.encodeStateAsUpdate(room.doc));
    const outcome: (true | unknown)[] = [];
    for (const w of batch) {
      const stored = await this.documents.append(room.notebookId, w.update, w.authorId, this.em.fork(), running).then(() => true, (err: unknown) => err);
      if (stored === true) Y.applyUpdate(running, w.update);
      outcome.push(stored);
    }
    running.destroy();
    return outcome;
  }
}

import { EntityManager } from '@mikro-orm/sqlite';
import { Injectable } from '@nestjs/common';
import type { Socket } from 'socket.io';
import * as Y from 'yjs';
import { DocumentsService } from '../documents/documents.service';
import { updateFrame } from './doc-frames';
import { DocumentBroadcast } from './document-broadcast';
import type { DocumentRoom } from './document-room';

/**
 * Takes an accepted update through its three steps, in this order: store it
 * (DocumentsService.append writes it to SQLite before returning), apply it to
 * the room's doc, pass it on. Nobody hears of, or acknowledges, an edit that
 * a crash could lose.
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
   * Stores and spreads one update. `sender` is left out of the broadcast;
   * without one (a restore) everyone in the room gets it. Throws what append
   * throws when the update breaks the document or cannot be read.
   */
  async write(room: DocumentRoom, update: Uint8Array, authorId: string | null, sender?: Socket): Promise<void> {
    // Each write gets its own EntityManager: socket handlers have no request context.
    await this.documents.append(room.notebookId, update, authorId, this.em.fork());
    Y.applyUpdate(room.doc, update, sender?.id ?? 'server');
    this.broadcast.toRoom(room.notebookId, updateFrame(update), sender);
  }
}

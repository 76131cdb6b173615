import { EntityManager } from '@mikro-orm/sqlite';
import { Injectable, Logger, OnModuleDestroy } from '@nestjs/common';
import { DocumentsService } from '../documents/documents.service';
import { DocumentRoom } from './document-room';

/** How long a room stays loaded after its last socket leaves, so a reload or a flaky network does not reload it. */
export const ROOM_UNLOAD_AFTER_MS = 5_000;

/**
 * The notebooks' documents held in memory, one room per notebook. The first
 * load of a room is locked, so two simultaneous joins load it once.
 */
@Injectable()
export class DocumentRooms implements OnModuleDestroy {
  private readonly logger = new Logger('DocumentRooms');
  private readonly rooms = new Map<string, DocumentRoom>();
  private readonly loading = new Map<string, Promise<DocumentRoom>>();
  /** Settable by tests and benches; the default suits people. */
  unloadAfterMs = ROOM_UNLOAD_AFTER_MS;

  constructor(
    private readonly em: EntityManager,
    private readonly documents: DocumentsService,
  ) {}

  /** The room if it is loaded. */
  loaded(notebookId: string): DocumentRoom | undefined {
    return this.rooms.get(notebookId);
  }

  /** The room's load in progress, if it is being loaded right now. */
  loadingRoom(notebookId: string): Promise<DocumentRoom> | undefined {
    return this.loading.get(notebookId);
  }

  /** Every loaded room (for access re-checks and benches). */
  all(): DocumentRoom[] {
    return [...this.rooms.values()];
  }

  /** The room, loading it from the database if nobody holds it yet. */
  async open(notebookId: string): Promise<DocumentRoom> {
    const ready = this.rooms.get(notebookId);
    if (ready) {
      this.cancelUnload(ready);
      return ready;
    }
    let pending = this.loading.get(notebookId);
    if (!pending) {
      pending = this.load(notebookId).finally(() => this.loading.delete(notebookId));
      this.loading.set(notebookId, pending);
    }
    const room = await pending;
    this.cancelUnload(room);
    return room;
  }

  /** Runs server-side work on the room, keeping it loaded meanwhile. */
  async withRoom<T>(notebookId: string, work: (room: DocumentRoom) => Promise<T>): Promise<T> {
    const room = await this.open(notebookId);
    room.holds += 1;
    try {
      return await work(room);
    } finally {
      room.holds -= 1;
      this.releaseIfIdle(room);
    }
  }

  /** Schedules the room's unload if nobody follows it any more. */
  releaseIfIdle(room: DocumentRoom, retry = false): void {
    if ((!room.idle && !retry) || room.unloadTimer) return;
    room.unloadTimer = setTimeout(() => {
      room.unloadTimer = null;
      if (this.rooms.get(room.notebookId) !== room) return;
      // Still storing what its last sockets sent: look again later.
      if (!room.idle) return room.members.size === 0 ? this.releaseIfIdle(room, true) : undefined;
      this.rooms.delete(room.notebookId);
      room.destroy();
    }, this.unloadAfterMs);
    room.unloadTimer.unref();
  }

  onModuleDestroy(): void {
    for (const room of this.rooms.values()) room.destroy();
    this.rooms.clear();
  }

  private cancelUnload(room: DocumentRoom): void {
    if (room.unloadTimer) clearTimeout(room.unloadTimer);
    room.unloadTimer = null;
  }

  private async load(notebookId: string): Promise<DocumentRoom> {
    // State and update log are read in one transaction, so a compaction
    // committing between the two reads cannot hide the updates it folded.
    const doc = await this.em.fork().transactional((tx) => this.documents.load(notebookId, tx));
    const room = new DocumentRoom(notebookId, doc);
    this.rooms.set(notebookId, room);
    this.logger.debug?.(`loaded ${notebookId}`);
    return room;
  }
}

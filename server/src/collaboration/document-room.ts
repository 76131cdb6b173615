import type { NotebookRole } from '@upwell/common';
import type { Socket } from 'socket.io';
import * as awarenessProtocol from 'y-protocols/awareness';
import * as Y from 'yjs';

/** Socket.io room of everyone following a notebook's document. */
export const notebookRoom = (notebookId: string) => `notebook:${notebookId}`;

/** One socket following the document, with its cached role. */
export interface RoomMember {
  socket: Socket;
  userId: string;
  /** Looked up on join and refreshed when roles change, so messages are checked without a query. */
  role: NotebookRole;
  /** Awareness client ids this socket has announced, removed when it leaves. */
  awarenessClients: Set<number>;
}

/** An accepted update waiting for its turn to be stored (see DocumentWriter). */
export interface PendingWrite {
  update: Uint8Array;
  authorId: string | null;
  sender?: Socket;
  done: (err?: unknown) => void;
}

/**
 * A notebook's document held in memory while anyone follows it. The doc
 * holds only stored content: updates are applied here after they are on disk.
 */
export class DocumentRoom {
  readonly awareness: awarenessProtocol.Awareness;
  readonly members = new Map<string, RoomMember>();
  /** Server-side work (a checkpoint, a restore) that needs the room kept loaded. */
  holds = 0;
  unloadTimer: NodeJS.Timeout | null = null;
  /** Updates waiting while an earlier batch is being stored. */
  readonly pendingWrites: PendingWrite[] = [];
  writing = false;

  constructor(
    readonly notebookId: string,
    readonly doc: Y.Doc,
  ) {
    this.awareness = new awarenessProtocol.Awareness(doc);
    // The server is no participant: it has no presence of its own.
    this.awareness.setLocalState(null);
    this.awareness.on('update', ({ added, removed }: { added: number[]; removed: number[] }, origin: unknown) => {
      const member = typeof origin === 'string' ? this.members.get(origin) : undefined;
      if (!member) return;
      for (const id of added) member.awarenessClients.add(id);
      for (const id of removed) member.awarenessClients.delete(id);
    });
  }

  /** Whether nobody and nothing needs the room any more. */
  get idle(): boolean {
    return this.members.size === 0 && this.holds === 0 && !this.writing && this.pendingWrites.length === 0;
  }

  destroy(): void {
    if (this.unloadTimer) clearTimeout(this.unloadTimer);
    this.awareness.destroy();
    this.doc.destroy();
  }
}

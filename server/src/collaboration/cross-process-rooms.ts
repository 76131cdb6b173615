import { Injectable, Logger, type OnModuleInit } from '@nestjs/common';
import * as awarenessProtocol from 'y-protocols/awareness';
import * as Y from 'yjs';
import { PROCESS_EVENTS, ProcessFanout } from '../realtime/process-fanout';
import { readDocFrame, type DocFrame } from './doc-frames';
import { DocumentBroadcast, type CrossProcessFrame } from './document-broadcast';
import type { DocumentRoom } from './document-room';
import { DocumentRooms } from './document-rooms';

/** Origin of changes applied because another process accepted them: nothing here stores or re-sends them. */
export const OTHER_PROCESS = 'other-process';

/**
 * Keeps this process's rooms in step with the other processes' (REDIS_URL).
 * Another process sends each update only after storing it, and each presence
 * change; this applies it to the room's doc or awareness, if the room is open
 * here, then passes the frame on to this process's sockets. A room still
 * loading gets the frame once loaded, so an update stored while its load read
 * the database is not missed (Yjs applies a duplicate as a no-op). A room not
 * open here needs nothing: it loads from the database, which already holds it.
 */
@Injectable()
export class CrossProcessRooms implements OnModuleInit {
  private readonly logger = new Logger('CrossProcessRooms');

  constructor(
    private readonly fanout: ProcessFanout,
    private readonly rooms: DocumentRooms,
    private readonly broadcast: DocumentBroadcast,
  ) {}

  onModuleInit(): void {
    this.fanout.on(PROCESS_EVENTS.docFrame, (payload) => this.receive(payload));
  }

  /** A frame another process sent for a notebook's room. */
  receive(payload: unknown): void {
    const { notebookId, data: base64 } = (payload ?? {}) as Partial<CrossProcessFrame>;
    if (typeof notebookId !== 'string' || typeof base64 !== 'string') return;
    const data = new Uint8Array(Buffer.from(base64, 'base64'));
    const frame = readDocFrame(data);
    const room = this.rooms.loaded(notebookId);
    if (room) return this.apply(room, frame, data);
    this.rooms.loadingRoom(notebookId)?.then(
      (loaded) => this.apply(loaded, frame, data),
      () => undefined, // the load failed; whoever opened it hears of that
    );
  }

  private apply(room: DocumentRoom, frame: DocFrame, data: Uint8Array): void {
    if (frame.kind === 'update') Y.applyUpdate(room.doc, frame.update, OTHER_PROCESS);
    else if (frame.kind === 'awareness') awarenessProtocol.applyAwarenessUpdate(room.awareness, frame.update, OTHER_PROCESS);
    else return this.logger.warn(`ignored a ${frame.kind} frame from another process`);
    this.broadcast.toLocalRoom(room.notebookId, data);
  }
}

import { Injectable } from '@nestjs/common';
import { DOC_EVENTS, type DocMessage } from '@upwell/common';
import type { Server, Socket } from 'socket.io';
import { PROCESS_EVENTS, ProcessFanout } from '../realtime/process-fanout';
import { notebookRoom } from './document-room';

/** A framed document message as it travels between server processes. */
export interface CrossProcessFrame {
  notebookId: string;
  /** The frame's bytes, base64 (serverSideEmit carries JSON). */
  data: string;
}

/**
 * Sends framed document messages to the sockets following a notebook. Room
 * messages go to this process's sockets directly and to the other processes
 * (REDIS_URL) as one message each, which apply them to their copy of the room
 * before passing them on to their own sockets (see CrossProcessRooms).
 */
@Injectable()
export class DocumentBroadcast {
  private server: Server | null = null;

  constructor(private readonly fanout: ProcessFanout) {}

  /** Set by the document gateway once socket.io is up. */
  attach(server: Server): void {
    this.server = server;
  }

  /** To everyone in the notebook's room, on every process, but `except` (the sender, who already has it). */
  toRoom(notebookId: string, data: Uint8Array, except?: Socket): void {
    this.toLocalRoom(notebookId, data, except);
    this.fanout.toOthers(PROCESS_EVENTS.docFrame, { notebookId, data: Buffer.from(data).toString('base64') } satisfies CrossProcessFrame);
  }

  /** To this process's sockets in the notebook's room only (`local`: the Redis adapter would send it everywhere). */
  toLocalRoom(notebookId: string, data: Uint8Array, except?: Socket): void {
    const message: DocMessage = { notebookId, data };
    if (except) except.local.to(notebookRoom(notebookId)).emit(DOC_EVENTS.message, message);
    else this.server?.local.to(notebookRoom(notebookId)).emit(DOC_EVENTS.message, message);
  }

  /** To one socket. */
  toSocket(socket: Socket, notebookId: string, data: Uint8Array): void {
    socket.emit(DOC_EVENTS.message, { notebookId, data } satisfies DocMessage);
  }
}

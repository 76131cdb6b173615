import { Injectable } from '@nestjs/common';
import { DOC_EVENTS, type DocMessage } from '@upwell/common';
import type { Server, Socket } from 'socket.io';
import { notebookRoom } from './document-room';

/** Sends framed document messages to the sockets following a notebook. */
@Injectable()
export class DocumentBroadcast {
  private server: Server | null = null;

  /** Set by the document gateway once socket.io is up. */
  attach(server: Server): void {
    this.server = server;
  }

  /** To everyone in the notebook's room but `except` (the sender, who already has it). */
  toRoom(notebookId: string, data: Uint8Array, except?: Socket): void {
    const message: DocMessage = { notebookId, data };
    if (except) except.to(notebookRoom(notebookId)).emit(DOC_EVENTS.message, message);
    else this.server?.to(notebookRoom(notebookId)).emit(DOC_EVENTS.message, message);
  }

  /** To one socket. */
  toSocket(socket: Socket, notebookId: string, data: Uint8Array): void {
    socket.emit(DOC_EVENTS.message, { notebookId, data } satisfies DocMessage);
  }
}

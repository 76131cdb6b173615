import { Injectable, type OnModuleInit } from '@nestjs/common';
import { DocumentsService } from '../documents/documents.service';
import { ProcessFanout } from '../realtime/process-fanout';
import { updateFrame } from './doc-frames';
import { DocumentBroadcast } from './document-broadcast';
import { DocumentRooms } from './document-rooms';
import { DocumentWriter } from './document-writer';

/**
 * Edits sent over HTTP (scripts, tools) to a notebook that people have open
 * go through that notebook's room, so they are stored, applied to the live
 * document and passed on to everyone in it, in order with the socket edits.
 * With several processes, one open only elsewhere is stored here and sent on.
 */
@Injectable()
export class HttpEditsThroughRooms implements OnModuleInit {
  constructor(
    private readonly documents: DocumentsService,
    private readonly rooms: DocumentRooms,
    private readonly writer: DocumentWriter,
    private readonly broadcast: DocumentBroadcast,
    private readonly fanout: ProcessFanout,
  ) {}

  onModuleInit(): void {
    this.documents.useLiveWriter(async (notebookId, update, authorId) => {
      const room = this.rooms.loaded(notebookId);
      if (room) {
        await this.writer.write(room, update, authorId);
        return true;
      }
      if (!this.fanout.enabled) return false;
      // Not open here, perhaps open in another process: store it, then let the others apply and pass it on.
      await this.documents.append(notebookId, update, authorId);
      this.broadcast.toRoom(notebookId, updateFrame(update));
      return true;
    });
  }
}

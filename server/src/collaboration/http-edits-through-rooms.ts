import { Injectable, type OnModuleInit } from '@nestjs/common';
import { DocumentsService } from '../documents/documents.service';
import { DocumentRooms } from './document-rooms';
import { DocumentWriter } from './document-writer';

/**
 * Edits sent over HTTP (scripts, tools) to a notebook that people have open
 * go through that notebook's room, so they are stored, applied to the live
 * document and passed on to everyone in it, in order with the socket edits.
 */
@Injectable()
export class HttpEditsThroughRooms implements OnModuleInit {
  constructor(
    private readonly documents: DocumentsService,
    private readonly rooms: DocumentRooms,
    private readonly writer: DocumentWriter,
  ) {}

  onModuleInit(): void {
    this.documents.useLiveWriter(async (notebookId, update, authorId) => {
      const room = this.rooms.loaded(notebookId);
      if (!room) return false;
      await this.writer.write(room, update, authorId);
      return true;
    });
  }
}

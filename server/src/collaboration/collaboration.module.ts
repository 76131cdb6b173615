import { Module } from '@nestjs/common';
import { DocumentsModule } from '../documents/documents.module';
import { NotebookAccessModule } from '../notebooks/notebook-access.module';
import { AwarenessRelay } from './awareness-relay';
import { DocumentAccess } from './document-access';
import { DocumentBroadcast } from './document-broadcast';
import { DocumentGateway } from './document.gateway';
import { DocumentMessages } from './document-messages';
import { DocumentRooms } from './document-rooms';
import { DocumentSessions } from './document-sessions';
import { DocumentWriter } from './document-writer';
import { RoomMembership } from './room-membership';
import { HttpEditsThroughRooms } from './http-edits-through-rooms';
import { CrossProcessRooms } from './cross-process-rooms';

/**
 * Real-time co-editing of notebook documents: rooms of live Yjs documents,
 * the y-protocols sync and presence over the app's socket. Exports the access
 * re-check for services that change roles, and the rooms and writer for
 * server-side changes (checkpoint restores).
 */
@Module({
  imports: [DocumentsModule, NotebookAccessModule],
  providers: [DocumentGateway, DocumentSessions, DocumentMessages, DocumentRooms, DocumentWriter, DocumentBroadcast, AwarenessRelay, RoomMembership, DocumentAccess, HttpEditsThroughRooms, CrossProcessRooms],
  exports: [DocumentAccess, DocumentRooms, DocumentWriter],
})
export class CollaborationModule {}

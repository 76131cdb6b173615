import { Injectable } from '@nestjs/common';
import * as awarenessProtocol from 'y-protocols/awareness';
import { awarenessFrame } from './doc-frames';
import { DocumentBroadcast } from './document-broadcast';
import type { DocumentRoom, RoomMember } from './document-room';

/**
 * Presence (cursors, names, selections) of the people in a room. Kept in the
 * room's awareness so someone joining late sees who is there; never stored.
 */
@Injectable()
export class AwarenessRelay {
  constructor(private readonly broadcast: DocumentBroadcast) {}

  /** Applies a member's awareness update and passes the frame on to the others. Throws if it cannot be read. */
  relay(room: DocumentRoom, member: RoomMember, frameData: Uint8Array, update: Uint8Array): void {
    awarenessProtocol.applyAwarenessUpdate(room.awareness, update, member.socket.id);
    this.broadcast.toRoom(room.notebookId, frameData, member.socket);
  }

  /** The current presence of everyone, for a socket that just joined; null when nobody has any. */
  current(room: DocumentRoom): Uint8Array | null {
    const clients = [...room.awareness.getStates().keys()];
    return clients.length ? awarenessFrame(room.awareness, clients) : null;
  }

  /** Removes what a leaving member announced and tells the others it is gone. */
  forget(room: DocumentRoom, member: RoomMember): void {
    const clients = [...member.awarenessClients];
    if (!clients.length) return;
    awarenessProtocol.removeAwarenessStates(room.awareness, clients, null);
    member.awarenessClients.clear();
    this.broadcast.toRoom(room.notebookId, awarenessFrame(room.awareness, clients));
  }
}

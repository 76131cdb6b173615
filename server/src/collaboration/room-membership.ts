import { Injectable } from '@nestjs/common';
import type { NotebookRole } from '@upwell/common';
import type { Socket } from 'socket.io';
import { AwarenessRelay } from './awareness-relay';
import { notebookRoom, type DocumentRoom, type RoomMember } from './document-room';
import { DocumentRooms } from './document-rooms';

/** Puts sockets into a notebook's room and takes them out again, tidying their presence. */
@Injectable()
export class RoomMembership {
  constructor(
    private readonly rooms: DocumentRooms,
    private readonly awareness: AwarenessRelay,
  ) {}

  /** Adds (or refreshes) a socket as a member following the document. */
  async enter(room: DocumentRoom, socket: Socket, userId: string, role: NotebookRole): Promise<RoomMember> {
    await socket.join(notebookRoom(room.notebookId));
    const existing = room.members.get(socket.id);
    if (existing) {
      existing.role = role;
      return existing;
    }
    const member: RoomMember = { socket, userId, role, awarenessClients: new Set() };
    room.members.set(socket.id, member);
    return member;
  }

  /** The socket's membership of the notebook's room, if it has joined. */
  memberOf(socket: Socket, notebookId: string): { room: DocumentRoom; member: RoomMember } | null {
    const room = this.rooms.loaded(notebookId);
    const member = room?.members.get(socket.id);
    return room && member ? { room, member } : null;
  }

  /** Every room the socket follows. */
  roomsOf(socket: Socket): DocumentRoom[] {
    return this.rooms.all().filter((r) => r.members.has(socket.id));
  }

  /** Takes the socket out of the room; the room unloads a little later if it was the last. */
  async leave(room: DocumentRoom, socket: Socket): Promise<void> {
    const member = room.members.get(socket.id);
    if (!member) return;
    room.members.delete(socket.id);
    this.awareness.forget(room, member);
    await socket.leave(notebookRoom(room.notebookId));
    this.rooms.releaseIfIdle(room);
  }
}

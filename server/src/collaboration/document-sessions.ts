import { Injectable } from '@nestjs/common';
import {
  DOC_PAYLOAD_SHAPES,
  EDITOR_SCHEMA_VERSION,
  SOCKET_CLOSE_REASONS,
  docJoinRequestSchema,
  docLeaveRequestSchema,
  type DocJoinAck,
} from '@upwell/common';
import type { Socket } from 'socket.io';
import { AwarenessRelay } from './awareness-relay';
import { syncStep1Frame, syncStep2Frame } from './doc-frames';
import { DocumentAccess } from './document-access';
import { DocumentBroadcast } from './document-broadcast';
import { DocumentRooms } from './document-rooms';
import { NotebookPolicy } from '../notebooks/notebook.policy';
import { RoomMembership } from './room-membership';
import { readSocketPayload } from './socket-payload';

const NOT_FOUND = 'no such notebook, or you have no role on it';

/** Opening and closing a notebook's document for a socket. */
@Injectable()
export class DocumentSessions {
  constructor(
    private readonly access: DocumentAccess,
    private readonly rooms: DocumentRooms,
    private readonly membership: RoomMembership,
    private readonly broadcast: DocumentBroadcast,
    private readonly awareness: AwarenessRelay,
    private readonly policy: NotebookPolicy,
  ) {}

  /**
   * `doc:join`: checks the person and their editor, joins the room and starts
   * the y-protocols sync (see `startSync`, which the gateway calls once the
   * ack has gone out).
   */
  async join(socket: Socket, body: unknown): Promise<DocJoinAck> {
    const userId = await this.access.userOf(socket);
    if (!userId) return { ok: false, error: SOCKET_CLOSE_REASONS.unauthenticated };
    const request = readSocketPayload(docJoinRequestSchema, body, DOC_PAYLOAD_SHAPES.join);
    if (!request.ok) return request;
    const { notebookId, schemaVersion } = request.value;
    // A newer editor than this server's could write nodes the server's schema and older editors cannot read.
    if (!Number.isInteger(schemaVersion) || schemaVersion > EDITOR_SCHEMA_VERSION) {
      return { ok: false, error: `this server runs editor schema version ${EDITOR_SCHEMA_VERSION}; version ${schemaVersion} is not one it knows` };
    }
    if (schemaVersion < EDITOR_SCHEMA_VERSION) {
      return {
        ok: false,
        error: `your editor is older (schema version ${schemaVersion}) than the server's (${EDITOR_SCHEMA_VERSION}); reload the page to get the current editor`,
      };
    }
    const epoch = this.access.currentEpoch;
    if (!(await this.access.roleOf(userId, notebookId))) return { ok: false, error: NOT_FOUND };
    const room = await this.rooms.open(notebookId);
    // Check again once loaded: the role may have gone while the document loaded.
    let role = await this.access.roleOf(userId, notebookId);
    if (!role) {
      this.rooms.releaseIfIdle(room);
      return { ok: false, error: NOT_FOUND };
    }
    await this.membership.enter(room, socket, userId, role);
    if (this.access.currentEpoch !== epoch) {
      // A role change was re-checked while we joined and could not see this socket yet.
      role = await this.access.roleOf(userId, notebookId);
      if (!role) {
        await this.membership.leave(room, socket);
        return { ok: false, error: NOT_FOUND };
      }
      room.members.get(socket.id)!.role = role;
    }
    return { ok: true, role, canEdit: this.policy.roleAllows(role, 'edit') };
  }

  /**
   * Starts the y-protocols sync for a socket that has just been acked:
   * sync step 1 (the server's state vector, which the client answers with
   * what the server lacks), sync step 2 (the whole stored document), then the
   * presence of everyone already there.
   */
  startSync(socket: Socket, notebookId: string): void {
    const room = this.rooms.loaded(notebookId);
    if (!room?.members.has(socket.id)) return;
    this.broadcast.toSocket(socket, notebookId, syncStep1Frame(room.doc));
    this.broadcast.toSocket(socket, notebookId, syncStep2Frame(room.doc));
    const presence = this.awareness.current(room);
    if (presence) this.broadcast.toSocket(socket, notebookId, presence);
  }

  /** `doc:leave`: stops following the notebook. */
  async leave(socket: Socket, body: unknown): Promise<void> {
    const request = readSocketPayload(docLeaveRequestSchema, body, DOC_PAYLOAD_SHAPES.leave);
    if (!request.ok) return; // doc:leave has no ack: there is nobody to tell
    const joined = this.membership.memberOf(socket, request.value.notebookId);
    if (joined) await this.membership.leave(joined.room, socket);
  }

  /** The socket went away: leave every room, removing its presence. */
  async disconnected(socket: Socket): Promise<void> {
    for (const room of this.membership.roomsOf(socket)) await this.membership.leave(room, socket);
  }
}

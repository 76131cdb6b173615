import { EntityManager } from '@mikro-orm/sqlite';
import { RequestContext } from '@mikro-orm/core';
import { Injectable, Logger, type OnModuleInit } from '@nestjs/common';
import { DOC_EVENTS, type DocRefused, type NotebookRole } from '@upwell/common';
import type { Socket } from 'socket.io';
import { NotebookPolicy } from '../notebooks/notebook.policy';
import { PROCESS_EVENTS, ProcessFanout } from '../realtime/process-fanout';
import { authenticatedUserId } from '../realtime/realtime.gateway';
import { DocumentRooms } from './document-rooms';
import { RoomMembership } from './room-membership';

/** Which connections a role change may concern: one person, one notebook, or one person on one notebook. */
export interface AccessChange {
  userId?: string;
  notebookId?: string;
}

/**
 * Who is behind a socket and what their role lets them do with a document.
 * Roles are looked up through NotebookPolicy on join and cached on the room
 * member; services that change roles call `accessChanged`, which looks again
 * at once and closes the document for anyone who lost their role.
 */
@Injectable()
export class DocumentAccess implements OnModuleInit {
  private readonly logger = new Logger('DocumentAccess');
  /** Bumped by every re-check, so a join that raced one looks again. */
  private epoch = 0;

  constructor(
    private readonly em: EntityManager,
    private readonly policy: NotebookPolicy,
    private readonly rooms: DocumentRooms,
    private readonly membership: RoomMembership,
    private readonly fanout: ProcessFanout,
  ) {}

  onModuleInit(): void {
    // Another process changed roles: re-check the sockets this one holds.
    this.fanout.on(PROCESS_EVENTS.accessChanged, (change) => {
      const { userId, notebookId } = (change ?? {}) as AccessChange;
      if ((userId !== undefined && typeof userId !== 'string') || (notebookId !== undefined && typeof notebookId !== 'string')) return;
      this.recheck({ userId, notebookId }).catch((err) => this.logger.error(`re-checking access for another process failed: ${err}`));
    });
  }

  /** The signed-in person behind the socket (the app gateway checked the token), or null. */
  async userOf(socket: Socket): Promise<string | null> {
    return authenticatedUserId(socket).catch(() => null);
  }

  /** The person's role on the notebook, read fresh; null without one (or for a notebook that does not exist). */
  async roleOf(userId: string, notebookId: string): Promise<NotebookRole | null> {
    // Sockets and timers have no request context: give the policy one of its own.
    return RequestContext.create(this.em, async () => (await this.policy.roleOf(userId, notebookId))?.role ?? null);
  }

  /** The current re-check epoch (see `accessChanged`). */
  get currentEpoch(): number {
    return this.epoch;
  }

  /**
   * Call after roles changed (and were committed): every affected socket
   * following a document gets its role looked up again; one that lost it gets
   * `doc:access-revoked` and leaves the room, one that was downgraded is
   * refused edits from now on. Sockets on other processes are re-checked by
   * their own process.
   */
  async accessChanged(change: AccessChange): Promise<void> {
    this.fanout.toOthers(PROCESS_EVENTS.accessChanged, change);
    await this.recheck(change);
  }

  private async recheck(change: AccessChange): Promise<void> {
    this.epoch += 1;
    for (const room of this.rooms.all()) {
      if (change.notebookId && room.notebookId !== change.notebookId) continue;
      for (const member of [...room.members.values()]) {
        if (change.userId && member.userId !== change.userId) continue;
        const role = await this.roleOf(member.userId, room.notebookId).catch((err) => {
          // Failing closed: without a readable role the document closes for this socket.
          this.logger.error(`re-checking access to ${room.notebookId} failed: ${err}`);
          return null;
        });
        if (role) member.role = role;
        else await this.revoke(member.socket, room.notebookId);
      }
    }
  }

  /** Closes the document for a socket whose role is gone. */
  async revoke(socket: Socket, notebookId: string): Promise<void> {
    const joined = this.membership.memberOf(socket, notebookId);
    if (!joined) return;
    await this.membership.leave(joined.room, socket);
    const body: DocRefused = { notebookId, reason: 'your role on this notebook was taken away; the document is closed for you' };
    socket.emit(DOC_EVENTS.accessRevoked, body);
  }
}

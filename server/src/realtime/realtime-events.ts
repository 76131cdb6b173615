import { Injectable } from '@nestjs/common';
import { SOCKET_EVENTS, type SeriesVersionCreatedEvent, type UploadProgressEvent } from '@upwell/common';
import type { Server } from 'socket.io';

/** Room of everyone connected who belongs to a group. */
export const groupRoom = (groupId: string) => `group:${groupId}`;
/** Room of one person's connections (every tab they have open). */
export const userRoom = (userId: string) => `user:${userId}`;

/**
 * Pushes events to connected clients. Services call this after their
 * transaction has committed, so nobody hears of data that is not stored.
 */
@Injectable()
export class RealtimeEvents {
  private server: Server | null = null;

  /** Set by the gateway once socket.io is up. */
  attach(server: Server): void {
    this.server = server;
  }

  seriesVersionCreated(event: SeriesVersionCreatedEvent): void {
    this.server?.to(groupRoom(event.groupId)).emit(SOCKET_EVENTS.seriesVersionCreated, event);
  }

  seriesDeleted(groupId: string, seriesId: string): void {
    this.server?.to(groupRoom(groupId)).emit(SOCKET_EVENTS.seriesDeleted, { groupId, seriesId });
  }

  uploadProgress(userId: string, event: UploadProgressEvent): void {
    this.server?.to(userRoom(userId)).emit(SOCKET_EVENTS.uploadProgress, event);
  }

  /**
   * Sends to each named person's own room. Notebook events (comments) go this
   * way, to the people with a role on the notebook, never to a whole group.
   */
  toPeople(userIds: readonly string[], event: string, payload: unknown): void {
    if (!userIds.length) return;
    this.server?.to(userIds.map(userRoom)).emit(event, payload);
  }

  /** Makes every connection of a person join or leave a group's room at once (membership changed). */
  async setGroupMembership(userId: string, groupId: string, member: boolean): Promise<void> {
    if (!this.server) return;
    if (member) this.server.in(userRoom(userId)).socketsJoin(groupRoom(groupId));
    else this.server.in(userRoom(userId)).socketsLeave(groupRoom(groupId));
  }
}

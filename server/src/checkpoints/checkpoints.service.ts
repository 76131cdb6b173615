import { EntityManager } from '@mikro-orm/sqlite';
import { Injectable, NotFoundException } from '@nestjs/common';
import type { CheckpointView, CreateCheckpointRequest, RestoreCheckpointResponse } from '@upwell/common';
import * as Y from 'yjs';
import { DocumentRooms } from '../collaboration/document-rooms';
import { DocumentWriter } from '../collaboration/document-writer';
import { NotebookPolicy } from '../notebooks/notebook.policy';
import { User } from '../users/user.entity';
import { Checkpoint } from './checkpoint.entity';
import { presentCheckpoint } from './checkpoint.presenter';
import { restoreUpdate } from './restore-update';

/** Named checkpoints of a notebook's document, and restoring one for everyone. */
@Injectable()
export class CheckpointsService {
  constructor(
    private readonly em: EntityManager,
    private readonly policy: NotebookPolicy,
    private readonly rooms: DocumentRooms,
    private readonly writer: DocumentWriter,
  ) {}

  /** Names the document as it stands (every stored edit, as the live room holds it). */
  async create(user: User, notebookId: string, body: CreateCheckpointRequest): Promise<CheckpointView> {
    const { notebook } = await this.policy.authorize(user, notebookId, 'edit');
    const state = await this.rooms.withRoom(notebookId, async (room) => Y.encodeStateAsUpdate(room.doc));
    const checkpoint = this.em.create(Checkpoint, { notebook, name: body.name, state: Buffer.from(state), createdBy: user });
    await this.em.flush();
    return presentCheckpoint(checkpoint);
  }

  /** The notebook's checkpoints, newest first. */
  async list(user: User, notebookId: string): Promise<CheckpointView[]> {
    await this.policy.authorize(user, notebookId, 'read');
    const all = await this.em.find(Checkpoint, { notebook: notebookId }, { populate: ['createdBy'], orderBy: { createdAt: 'desc', id: 'asc' } });
    return all.map(presentCheckpoint);
  }

  /**
   * Makes the live document's content equal to the checkpoint's, as one
   * stored edit that everyone following the notebook receives.
   */
  async restore(user: User, notebookId: string, checkpointId: string): Promise<RestoreCheckpointResponse> {
    await this.policy.authorize(user, notebookId, 'edit');
    const checkpoint = await this.em.findOne(Checkpoint, { id: checkpointId, notebook: notebookId }, { populate: ['state', 'createdBy'] });
    if (!checkpoint) throw new NotFoundException('this notebook has no such checkpoint');
    const changed = await this.rooms.withRoom(notebookId, async (room) => {
      const update = restoreUpdate(room.doc, checkpoint.state);
      if (!update) return false;
      await this.writer.write(room, update, user.id);
      return true;
    });
    return { checkpoint: presentCheckpoint(checkpoint), changed, restoredAt: new Date().toISOString() };
  }
}

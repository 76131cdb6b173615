import { EntityManager } from '@mikro-orm/sqlite';
import { ForbiddenException, Injectable } from '@nestjs/common';
import { notebookRoleAllows, type NotebookRole } from '@upwell/common';
import { NotebookRoleAssignment } from '../notebooks/notebook.entity';
import type { User } from '../users/user.entity';

/** The delete rule as a sentence: a comment may be deleted by its author or by the notebook's lead author. */
export function mayDeleteComment(viewerId: string, role: NotebookRole, authorId: string): boolean {
  return role === 'lead-author' || viewerId === authorId;
}

/**
 * Who may do what with comments, beyond what NotebookPolicy decides (read to
 * see threads, comment to write them): "a comment may be deleted by its author
 * or by the notebook's lead author", and "only people who can read a notebook
 * hear of its comments or are notified of mentions in it".
 */
@Injectable()
export class CommentPolicy {
  constructor(private readonly em: EntityManager) {}

  /** Throws 403 unless the person may delete a comment by `authorId`. */
  assertMayDelete(user: User, role: NotebookRole, authorId: string, what: 'thread' | 'reply'): void {
    if (!mayDeleteComment(user.id, role, authorId)) {
      throw new ForbiddenException(`only its author or the lead author may delete this ${what}`);
    }
  }

  /** Ids of everyone whose role on the notebook lets them read it. */
  async readersOf(notebookId: string, em: EntityManager = this.em): Promise<string[]> {
    const roles = await em.find(NotebookRoleAssignment, { notebook: notebookId });
    return roles.filter((r) => notebookRoleAllows(r.role, 'read')).map((r) => r.user.id);
  }

  /** The mentioned people who can read the notebook, once each, never the author. */
  async mentionable(notebookId: string, authorId: string, mentioned: readonly string[], em: EntityManager = this.em): Promise<string[]> {
    if (!mentioned.length) return [];
    const readers = new Set(await this.readersOf(notebookId, em));
    return [...new Set(mentioned)].filter((id) => id !== authorId && readers.has(id));
  }
}

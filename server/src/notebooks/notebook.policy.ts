import { EntityManager } from '@mikro-orm/sqlite';
import { ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { NOTEBOOK_ROLE_LABELS, notebookRoleAllows, type NotebookAction, type NotebookRole } from '@upwell/common';
import type { User } from '../users/user.entity';
import { Notebook, NotebookRoleAssignment } from './notebook.entity';

const ACTION_WORDS: Record<NotebookAction, string> = {
  read: 'read this notebook',
  comment: 'comment on this notebook',
  edit: 'edit this notebook (lead author and co-authors)',
  'manage-access': 'manage who has access to this notebook (lead author only)',
  publish: 'publish snapshots of this notebook (lead author only)',
  rename: 'rename this notebook (lead author only)',
  archive: 'archive this notebook (lead author only)',
  delete: 'delete this notebook (lead author only)',
};

/** A person's standing on a notebook, once the policy has let them in. */
export interface NotebookAccess {
  notebook: Notebook;
  role: NotebookRole;
}

/**
 * Who may do what with a notebook, read as the permission matrix in
 * @upwell/common says: "a co-author may edit a notebook they hold a role on".
 * Routes and the socket gateway both ask here, nowhere else.
 */
@Injectable()
export class NotebookPolicy {
  constructor(private readonly em: EntityManager) {}

  /** The person's role on the notebook, or null if they have none. */
  async roleOf(user: User | string, notebookId: string): Promise<NotebookRoleAssignment | null> {
    return this.em.findOne(NotebookRoleAssignment, { user, notebook: notebookId }, { populate: ['notebook', 'notebook.owner'] });
  }

  /**
   * Lets the person through if their role allows the action. Without any role
   * the notebook does not exist for them (404); with a role that falls short,
   * 403 says what was refused.
   */
  async authorize(user: User, notebookId: string, action: NotebookAction): Promise<NotebookAccess> {
    const assignment = await this.roleOf(user, notebookId);
    if (!assignment) throw new NotFoundException('no such notebook, or you have no role on it');
    const refused = this.refusal(assignment.role, action);
    if (refused) throw new ForbiddenException(refused);
    return { notebook: assignment.notebook, role: assignment.role };
  }

  /**
   * The ids of the notebooks (of one group, or of every group with null) on which the person's role allows the action,
   * e.g. which they may read. Work outside a request passes its own forked `em`.
   */
  async notebooksAllowing(user: User | string, groupId: string | null, action: NotebookAction, em: EntityManager = this.em): Promise<Set<string>> {
    const assignments = await em.find(NotebookRoleAssignment, { user, ...(groupId === null ? {} : { notebook: { group: groupId } }) });
    return new Set(assignments.filter((a) => notebookRoleAllows(a.role, action)).map((a) => a.notebook.id));
  }

  /** Whether a role already looked up (the socket caches it per connection) allows the action. */
  roleAllows(role: NotebookRole, action: NotebookAction): boolean {
    return notebookRoleAllows(role, action);
  }

  /** Why a role already looked up may not do the action (the sentence HTTP answers with 403), or null if it may. */
  refusal(role: NotebookRole, action: NotebookAction): string | null {
    return notebookRoleAllows(role, action) ? null : `as ${NOTEBOOK_ROLE_LABELS[role].toLowerCase()} you may not ${ACTION_WORDS[action]}`;
  }

  /** Everyone whose role on the notebook allows the action (with their user), e.g. who may be sent its content by mail. */
  async peopleAllowed(notebookId: string, action: NotebookAction, em: EntityManager = this.em): Promise<NotebookRoleAssignment[]> {
    const assignments = await em.find(NotebookRoleAssignment, { notebook: notebookId }, { populate: ['user'] });
    return assignments.filter((a) => notebookRoleAllows(a.role, action));
  }

  /** Same rule without throwing, for sockets and for shaping what a client is offered. */
  async allows(user: User | string, notebookId: string, action: NotebookAction): Promise<boolean> {
    const assignment = await this.roleOf(user, notebookId);
    return notebookRoleAllows(assignment?.role, action);
  }
}

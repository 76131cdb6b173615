import { EntityManager } from '@mikro-orm/sqlite';
import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import {
  NOTEBOOK_ROLES,
  type AssignNotebookRoleRequest,
  type CreateNotebookRequest,
  type ListNotebooksQuery,
  type NotebookRoleView,
  type NotebookView,
  type UpdateNotebookRequest,
} from '@upwell/common';
import { DocumentAccess } from '../collaboration/document-access';
import { DocumentsService } from '../documents/documents.service';
import { GroupMembership } from '../groups/group.entity';
import { GroupPolicy } from '../groups/group.policy';
import type { User } from '../users/user.entity';
import { Notebook, NotebookRoleAssignment } from './notebook.entity';
import { NotebookPolicy } from './notebook.policy';
import { presentNotebook, presentNotebookRole } from './notebook.presenter';

/** Notebooks and who holds which role on them. */
@Injectable()
export class NotebooksService {
  constructor(
    private readonly em: EntityManager,
    private readonly groups: GroupPolicy,
    private readonly policy: NotebookPolicy,
    private readonly documents: DocumentsService,
    private readonly documentAccess: DocumentAccess,
  ) {}

  /** The group's notebooks the person holds a role on, newest edit first. */
  async list(user: User, groupId: string, query: ListNotebooksQuery): Promise<NotebookView[]> {
    await this.groups.authorize(user, groupId, 'view');
    const archived = query.archived === 'true';
    const roles = await this.em.find(
      NotebookRoleAssignment,
      {
        user,
        notebook: {
          group: groupId,
          archivedAt: archived ? { $ne: null } : null,
        },
      },
      { populate: ['notebook', 'notebook.owner', 'notebook.group'], orderBy: { notebook: { updatedAt: 'desc' } } },
    );
    const needle = query.q?.toLocaleLowerCase();
    // A person holds roles on tens of notebooks, not thousands: matching here keeps search free of LIKE-escaping rules.
    const matching = needle
      ? roles.filter((r) => `${r.notebook.title}\n${r.notebook.description}`.toLocaleLowerCase().includes(needle))
      : roles;
    return matching.map((r) => presentNotebook(r.notebook, r.role));
  }

  async create(user: User, groupId: string, body: CreateNotebookRequest): Promise<NotebookView> {
    const membership = await this.groups.authorize(user, groupId, 'create-notebook');
    const notebook = this.em.create(Notebook, { group: membership.group, title: body.title, description: body.description, owner: user });
    this.em.create(NotebookRoleAssignment, { notebook, user, role: 'lead-author' });
    this.documents.createInitial(this.em, notebook, body.title, body.description);
    await this.em.flush();
    return presentNotebook(notebook, 'lead-author');
  }

  /**
   * Copies a notebook (document, not its comments or snapshots) into a new one
   * led by the person copying; only a lead author may duplicate.
   */
  async duplicate(user: User, notebookId: string, title?: string): Promise<NotebookView> {
    const { notebook } = await this.policy.authorize(user, notebookId, 'delete');
    const copy = this.em.create(Notebook, { group: notebook.group, title: title ?? `${notebook.title} (copy)`.slice(0, 200), description: notebook.description, owner: user });
    this.em.create(NotebookRoleAssignment, { notebook: copy, user, role: 'lead-author' });
    await this.documents.copyInto(this.em, notebookId, copy);
    await this.em.flush();
    return presentNotebook(copy, 'lead-author');
  }

  async get(user: User, notebookId: string): Promise<NotebookView> {
    const { notebook, role } = await this.policy.authorize(user, notebookId, 'read');
    return presentNotebook(notebook, role);
  }

  async update(user: User, notebookId: string, body: UpdateNotebookRequest): Promise<NotebookView> {
    const action = body.archived !== undefined && body.title === undefined && body.description === undefined ? 'archive' : 'rename';
    const { notebook, role } = await this.policy.authorize(user, notebookId, action);
    if (body.archived !== undefined) await this.policy.authorize(user, notebookId, 'archive');
    if (body.title !== undefined) notebook.title = body.title;
    if (body.description !== undefined) notebook.description = body.description;
    if (body.archived !== undefined) notebook.archivedAt = body.archived ? (notebook.archivedAt ?? new Date()) : null;
    await this.em.flush();
    return presentNotebook(notebook, role);
  }

  async remove(user: User, notebookId: string): Promise<void> {
    const { notebook } = await this.policy.authorize(user, notebookId, 'delete');
    await this.em.transactional(async (em) => {
      await em.nativeDelete(NotebookRoleAssignment, { notebook: notebook.id });
      await em.nativeDelete(Notebook, { id: notebook.id });
    });
    // Anyone with the document open loses it at once.
    await this.documentAccess.accessChanged({ notebookId });
  }

  async roles(user: User, notebookId: string): Promise<NotebookRoleView[]> {
    await this.policy.authorize(user, notebookId, 'read');
    const all = await this.em.find(NotebookRoleAssignment, { notebook: notebookId }, { populate: ['user'] });
    const rank = (r: NotebookRoleAssignment) => NOTEBOOK_ROLES.indexOf(r.role);
    return all.sort((a, b) => rank(a) - rank(b) || a.user.name.localeCompare(b.user.name)).map(presentNotebookRole);
  }

  /**
   * Gives a group member a role on the notebook. Naming a new lead author hands
   * over the notebook: the old lead author becomes a co-author, so there is
   * always exactly one.
   */
  async assignRole(user: User, notebookId: string, userId: string, body: AssignNotebookRoleRequest): Promise<NotebookRoleView[]> {
    const { notebook } = await this.policy.authorize(user, notebookId, 'manage-access');
    const member = await this.em.findOne(GroupMembership, { group: notebook.group, user: userId }, { populate: ['user'] });
    if (!member) throw new NotFoundException('that person is not a member of this notebook’s group; add them to the group first');
    if (userId === notebook.owner.id && body.role !== 'lead-author') {
      throw new BadRequestException('the lead author keeps their role; name another lead author to hand the notebook over');
    }
    await this.em.transactional(async (em) => {
      if (body.role === 'lead-author' && userId !== notebook.owner.id) {
        const previous = await em.findOneOrFail(NotebookRoleAssignment, { notebook, user: notebook.owner });
        previous.role = 'co-author';
        notebook.owner = member.user;
      }
      const existing = await em.findOne(NotebookRoleAssignment, { notebook, user: userId });
      if (existing) existing.role = body.role;
      else em.create(NotebookRoleAssignment, { notebook, user: member.user, role: body.role });
    });
    // A downgraded author's open document turns read-only at once (a hand-over changes two people's roles).
    await this.documentAccess.accessChanged({ notebookId });
    return this.roles(user, notebookId);
  }

  async removeRole(user: User, notebookId: string, userId: string): Promise<void> {
    const { notebook } = await this.policy.authorize(user, notebookId, 'manage-access');
    if (userId === notebook.owner.id) throw new BadRequestException('the lead author cannot be removed; hand the notebook over first');
    const deleted = await this.em.nativeDelete(NotebookRoleAssignment, { notebook: notebookId, user: userId });
    if (!deleted) throw new NotFoundException('that person has no role on this notebook');
    // Their open document closes at once, not at their next reconnect.
    await this.documentAccess.accessChanged({ notebookId, userId });
  }
}


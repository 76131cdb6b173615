import { EntityManager } from '@mikro-orm/sqlite';
import { ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { groupRoleAllows, type GroupAction } from '@upwell/common';
import type { User } from '../users/user.entity';
import { GroupMembership } from './group.entity';

const ACTION_WORDS: Record<GroupAction, string> = {
  view: 'see this group',
  'create-notebook': 'create notebooks in this group',
  'manage-members': 'manage the members of this group (group admins only)',
  rename: 'rename this group (group admins only)',
  'delete-series': 'delete series of this group (group admins only)',
  'upload-series': 'upload series to this group',
  'read-mail': 'read the mail sent about this group (group admins only)',
};

/**
 * Who may do what in a research group: a member works in it, an admin also
 * runs it. The one place group access is decided, for routes and sockets alike.
 */
@Injectable()
export class GroupPolicy {
  constructor(private readonly em: EntityManager) {}

  /** The person's membership of the group, or null. */
  membership(user: User, groupId: string): Promise<GroupMembership | null> {
    return this.em.findOne(GroupMembership, { user, group: groupId }, { populate: ['group'] });
  }

  /** The groups whose events the person may hear over the socket: each group where their role allows `view`. */
  async viewableGroupIds(user: User | string): Promise<string[]> {
    const memberships = await this.em.find(GroupMembership, { user });
    return memberships.filter((m) => groupRoleAllows(m.role, 'view')).map((m) => m.group.id);
  }

  /**
   * The membership, if it allows the action. Someone outside the group gets
   * 404 (the group's existence is not theirs to learn); a member without the
   * right gets 403 saying what they tried.
   */
  async authorize(user: User, groupId: string, action: GroupAction): Promise<GroupMembership> {
    const membership = await this.membership(user, groupId);
    if (!membership) throw new NotFoundException('no such group, or you are not a member of it');
    if (!groupRoleAllows(membership.role, action)) {
      throw new ForbiddenException(`your group role (${membership.role}) does not allow you to ${ACTION_WORDS[action]}`);
    }
    return membership;
  }

  /** Same rule without throwing: whether the person's role in the group allows the action (no membership: no). */
  async allows(user: User, groupId: string, action: GroupAction): Promise<boolean> {
    return groupRoleAllows((await this.em.findOne(GroupMembership, { user, group: groupId }))?.role, action);
  }

  /** The ids of every group in which the person's role allows the action (e.g. whose mail they may read). */
  async groupsAllowing(user: User, action: GroupAction): Promise<Set<string>> {
    const memberships = await this.em.find(GroupMembership, { user });
    return new Set(memberships.filter((m) => groupRoleAllows(m.role, action)).map((m) => m.group.id));
  }
}

import { EntityManager } from '@mikro-orm/sqlite';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import type { AddMemberRequest, ChangeMemberRoleRequest, CreateGroupRequest, GroupDetail, GroupSummary } from '@upwell/common';
import { DocumentAccess } from '../collaboration/document-access';
import { Notebook, NotebookRoleAssignment } from '../notebooks/notebook.entity';
import { RealtimeEvents } from '../realtime/realtime-events';
import { User } from '../users/user.entity';
import { Group, GroupMembership } from './group.entity';
import { GroupPolicy } from './group.policy';
import { presentGroupDetail, presentGroupSummary } from './group.presenter';

/** Research groups and their members. */
@Injectable()
export class GroupsService {
  constructor(
    private readonly em: EntityManager,
    private readonly policy: GroupPolicy,
    private readonly events: RealtimeEvents,
    private readonly documentAccess: DocumentAccess,
  ) {}

  async listMine(user: User): Promise<GroupSummary[]> {
    const ms = await this.em.find(GroupMembership, { user }, { populate: ['group'], orderBy: { group: { name: 'asc' } } });
    return ms.map(presentGroupSummary);
  }

  /** Creates a group with its creator as admin. */
  async create(user: User, body: CreateGroupRequest): Promise<GroupDetail> {
    const group = this.em.create(Group, { name: body.name });
    const mine = this.em.create(GroupMembership, { group, user, role: 'admin' });
    await this.em.flush();
    return presentGroupDetail(mine, [mine]);
  }

  async detail(user: User, groupId: string): Promise<GroupDetail> {
    const mine = await this.policy.authorize(user, groupId, 'view');
    return presentGroupDetail(mine, await this.members(groupId));
  }

  async rename(user: User, groupId: string, name: string): Promise<GroupDetail> {
    const mine = await this.policy.authorize(user, groupId, 'rename');
    mine.group.name = name;
    await this.em.flush();
    return presentGroupDetail(mine, await this.members(groupId));
  }

  /** Adds a person who already has an account (invitations by e-mail come with their own flow). */
  async addMember(user: User, groupId: string, body: AddMemberRequest): Promise<GroupDetail> {
    const mine = await this.policy.authorize(user, groupId, 'manage-members');
    const person = await this.em.findOne(User, { email: body.email });
    if (!person) throw new NotFoundException('no Upwell account uses this e-mail; ask the person to sign up first');
    if (await this.em.count(GroupMembership, { group: groupId, user: person })) {
      throw new ConflictException(`${person.name} is already a member of this group`);
    }
    this.em.create(GroupMembership, { group: mine.group, user: person, role: body.role });
    await this.em.flush();
    await this.events.setGroupMembership(person.id, groupId, true);
    return presentGroupDetail(mine, await this.members(groupId));
  }

  async changeRole(user: User, groupId: string, userId: string, body: ChangeMemberRoleRequest): Promise<GroupDetail> {
    const mine = await this.policy.authorize(user, groupId, 'manage-members');
    const target = await this.findMember(groupId, userId);
    if (target.role === 'admin' && body.role !== 'admin') await this.refuseIfLastAdmin(groupId);
    target.role = body.role;
    await this.em.flush();
    return presentGroupDetail(mine, await this.members(groupId));
  }

  /**
   * Removes a member (an admin may remove anyone, a member only themselves).
   * Their notebook roles in the group go with them, in one transaction.
   */
  async removeMember(user: User, groupId: string, userId: string): Promise<void> {
    if (userId !== user.id) await this.policy.authorize(user, groupId, 'manage-members');
    else await this.policy.authorize(user, groupId, 'view');
    const target = await this.findMember(groupId, userId);
    if (target.role === 'admin') await this.refuseIfLastAdmin(groupId);
    const led = await this.em.find(Notebook, { group: groupId, owner: userId });
    if (led.length) {
      throw new ConflictException(
        `${target.user.name} is lead author of ${led.map((n) => `“${n.title}”`).join(', ')}; hand lead authorship to someone else first`,
      );
    }
    await this.em.transactional(async (em) => {
      await em.nativeDelete(NotebookRoleAssignment, { user: userId, notebook: { group: groupId } });
      await em.nativeDelete(GroupMembership, { id: target.id });
    });
    // Access removed while connected takes effect at once: their sockets leave the group's room.
    await this.events.setGroupMembership(userId, groupId, false);
    await this.documentAccess.accessChanged({ userId });
  }

  private members(groupId: string): Promise<GroupMembership[]> {
    return this.em.find(GroupMembership, { group: groupId }, { populate: ['user', 'group'], orderBy: { user: { name: 'asc' } } });
  }

  private async findMember(groupId: string, userId: string): Promise<GroupMembership> {
    const m = await this.em.findOne(GroupMembership, { group: groupId, user: userId }, { populate: ['user'] });
    if (!m) throw new NotFoundException('that person is not a member of this group');
    return m;
  }

  private async refuseIfLastAdmin(groupId: string): Promise<void> {
    if ((await this.em.count(GroupMembership, { group: groupId, role: 'admin' })) <= 1) {
      throw new ConflictException('a group needs at least one admin; make someone else admin first');
    }
  }
}

import { EntityManager } from '@mikro-orm/sqlite';
import { Injectable } from '@nestjs/common';
import type { MeResponse, UpdateMeRequest } from '@upwell/common';
import { GroupMembership } from '../groups/group.entity';
import { presentGroupSummary } from '../groups/group.presenter';
import { User } from './user.entity';
import { presentUser } from './user.presenter';

/** The signed-in person's own account. */
@Injectable()
export class UsersService {
  constructor(private readonly em: EntityManager) {}

  async me(user: User): Promise<MeResponse> {
    const memberships = await this.em.find(GroupMembership, { user }, { populate: ['group'], orderBy: { group: { name: 'asc' } } });
    return {
      ...presentUser(user),
      createdAt: user.createdAt.toISOString(),
      emailNotifications: user.emailNotifications,
      groups: memberships.map(presentGroupSummary),
    };
  }

  async updateMe(user: User, body: UpdateMeRequest): Promise<MeResponse> {
    if (body.name !== undefined) user.name = body.name;
    if (body.emailNotifications !== undefined) user.emailNotifications = body.emailNotifications;
    await this.em.flush();
    return this.me(user);
  }
}

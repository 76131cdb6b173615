import { EntityManager } from '@mikro-orm/sqlite';
import { Injectable, NotFoundException } from '@nestjs/common';
import type { GroupAction } from '@upwell/common';
import { GroupPolicy } from '../groups/group.policy';
import type { User } from '../users/user.entity';
import { RegionSet } from './region-set.entity';

/**
 * Who may do what with a region set: it belongs to its group, so a member may read it and one
 * whose group role may upload series may add sets and versions. Outsiders learn nothing (404).
 */
@Injectable()
export class RegionSetPolicy {
  constructor(
    private readonly em: EntityManager,
    private readonly groups: GroupPolicy,
  ) {}

  /** The region set, if the person's group role allows the action on its group. */
  async authorize(user: User, regionSetId: string, action: Extract<GroupAction, 'view' | 'upload-series'>): Promise<RegionSet> {
    const set = await this.em.findOne(RegionSet, { id: regionSetId }, { populate: ['group'] });
    if (!set) throw new NotFoundException('no such region set');
    try {
      await this.groups.authorize(user, set.group.id, action);
    } catch (e) {
      if (e instanceof NotFoundException) throw new NotFoundException('no such region set');
      throw e;
    }
    return set;
  }
}

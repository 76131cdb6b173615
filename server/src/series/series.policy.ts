import { EntityManager } from '@mikro-orm/sqlite';
import { ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { groupRoleAllows, type GroupAction } from '@upwell/common';
import { GroupMembership } from '../groups/group.entity';
import type { User } from '../users/user.entity';
import { Series } from './series.entity';

/**
 * Who may do what with a stored series: the group's members see and upload,
 * the group's admins may also delete. Outside the group a series does not exist.
 */
@Injectable()
export class SeriesPolicy {
  constructor(private readonly em: EntityManager) {}

  async authorize(user: User, seriesId: string, action: Extract<GroupAction, 'view' | 'upload-series' | 'delete-series'>): Promise<Series> {
    const series = await this.em.findOne(Series, { id: seriesId }, { populate: ['group', 'createdBy'] });
    const membership = series && (await this.em.findOne(GroupMembership, { group: series.group, user }));
    if (!series || !membership) throw new NotFoundException('no such series, or it belongs to a group you are not in');
    if (!groupRoleAllows(membership.role, action)) {
      throw new ForbiddenException(
        action === 'delete-series' ? 'only a group admin may delete a series' : `your group role (${membership.role}) does not allow this`,
      );
    }
    return series;
  }
}

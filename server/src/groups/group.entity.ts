import { OptionalProps, Entity, ManyToOne, PrimaryKey, Property, Unique, Enum } from '@mikro-orm/core';
import { randomUUID } from 'node:crypto';
import { GROUP_ROLES, type GroupRole } from '@upwell/common';
import { User } from '../users/user.entity';

/** A research group: the unit that owns series and notebooks. */
@Entity({ tableName: 'groups' })
export class Group {
  [OptionalProps]?: 'createdAt';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @Property({ type: 'string', length: 120 })
  name!: string;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();
}

/** One person's membership of a group, with their group role. */
@Entity({ tableName: 'group_memberships' })
@Unique({ properties: ['group', 'user'] })
export class GroupMembership {
  [OptionalProps]?: 'createdAt';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @ManyToOne(() => Group, { deleteRule: 'cascade' })
  group!: Group;

  @ManyToOne(() => User, { deleteRule: 'cascade' })
  user!: User;

  @Enum({ items: () => GROUP_ROLES as unknown as string[], type: 'string' })
  role!: GroupRole;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();
}

import { OptionalProps, Entity, Enum, ManyToOne, PrimaryKey, Property, Unique } from '@mikro-orm/core';
import { randomUUID } from 'node:crypto';
import { NOTEBOOK_ROLES, type NotebookRole } from '@upwell/common';
import { Group } from '../groups/group.entity';
import { User } from '../users/user.entity';

/** A notebook: one event analysis being written by a group. */
@Entity({ tableName: 'notebooks' })
export class Notebook {
  [OptionalProps]?: 'description' | 'archivedAt' | 'createdAt' | 'updatedAt';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @ManyToOne(() => Group, { deleteRule: 'cascade' })
  group!: Group;

  @Property({ type: 'string', length: 200 })
  title!: string;

  @Property({ type: 'text', default: '' })
  description: string = '';

  @ManyToOne(() => User)
  owner!: User;

  @Property({ type: 'datetime', nullable: true })
  archivedAt: Date | null = null;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', onUpdate: () => new Date() })
  updatedAt: Date = new Date();
}

/** One person's role on one notebook. */
@Entity({ tableName: 'notebook_roles' })
@Unique({ properties: ['notebook', 'user'] })
export class NotebookRoleAssignment {
  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @ManyToOne(() => Notebook, { deleteRule: 'cascade' })
  notebook!: Notebook;

  @ManyToOne(() => User, { deleteRule: 'cascade' })
  user!: User;

  @Enum({ items: () => NOTEBOOK_ROLES as unknown as string[], type: 'string' })
  role!: NotebookRole;
}

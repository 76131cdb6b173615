import { OptionalProps, Entity, PrimaryKey, Property, Unique } from '@mikro-orm/core';
import { randomUUID } from 'node:crypto';

/** A person with an Upwell account. */
@Entity({ tableName: 'users' })
export class User {
  [OptionalProps]?: 'tokenVersion' | 'createdAt' | 'emailNotifications';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @Unique()
  @Property({ type: 'string', length: 254 })
  email!: string;

  @Property({ type: 'string', length: 120 })
  name!: string;

  @Property({ type: 'string', hidden: true, lazy: true })
  passwordHash!: string;

  /** Raised on sign-out: tokens carry it, and older ones stop working. */
  @Property({ type: 'integer', default: 0 })
  tokenVersion: number = 0;

  /** Whether notification mail (snapshots, mentions) is sent to this person; invitations always are. */
  @Property({ type: 'boolean', default: true })
  emailNotifications: boolean = true;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();
}

import { Entity, Enum, Index, ManyToOne, OptionalProps, PrimaryKey, Property, Unique } from '@mikro-orm/core';
import { randomUUID } from 'node:crypto';
import { INVITATION_KINDS, type InvitationKind } from '@upwell/common';
import { Group } from '../groups/group.entity';
import { Notebook } from '../notebooks/notebook.entity';
import { User } from '../users/user.entity';

/**
 * An invitation by e-mail to a group role or a notebook role. Only the
 * SHA-256 of its link's token is stored, so a copy of the database opens no
 * invitation; it works once, until it expires or is revoked.
 */
@Entity({ tableName: 'invitations' })
@Index({ properties: ['group', 'email'] })
export class Invitation {
  [OptionalProps]?: 'createdAt' | 'acceptedAt' | 'acceptedBy' | 'revokedAt' | 'notebook';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @Enum({ items: () => INVITATION_KINDS as unknown as string[], type: 'string' })
  kind!: InvitationKind;

  @ManyToOne(() => Group, { deleteRule: 'cascade' })
  group!: Group;

  @ManyToOne(() => Notebook, { deleteRule: 'cascade', nullable: true })
  notebook: Notebook | null = null;

  @Property({ type: 'string', length: 254 })
  email!: string;

  /** A group role for kind group, a notebook role for kind notebook. */
  @Property({ type: 'string', length: 20 })
  role!: string;

  @Unique()
  @Property({ type: 'string', length: 64, hidden: true })
  tokenSha256!: string;

  @ManyToOne(() => User, { deleteRule: 'set null', nullable: true })
  invitedBy!: User | null;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime' })
  expiresAt!: Date;

  @Property({ type: 'datetime', nullable: true })
  acceptedAt: Date | null = null;

  @ManyToOne(() => User, { deleteRule: 'set null', nullable: true })
  acceptedBy: User | null = null;

  @Property({ type: 'datetime', nullable: true })
  revokedAt: Date | null = null;
}

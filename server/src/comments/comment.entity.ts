import { Entity, ManyToOne, OptionalProps, PrimaryKey, Property } from '@mikro-orm/core';
import { randomUUID } from 'node:crypto';
import type { CommentAnchor } from '@upwell/common';
import { Notebook } from '../notebooks/notebook.entity';
import { User } from '../users/user.entity';

/**
 * A review thread: the first comment on a passage or figure of a notebook.
 * The anchor is stored as the client sent it (relative positions, quote), so
 * the document schema never has to know about comments.
 */
@Entity({ tableName: 'comment_threads' })
export class CommentThread {
  [OptionalProps]?: 'createdAt' | 'resolvedAt' | 'resolvedBy';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @ManyToOne(() => Notebook, { deleteRule: 'cascade' })
  notebook!: Notebook;

  @Property({ type: 'json' })
  anchor!: CommentAnchor;

  @ManyToOne(() => User, { deleteRule: 'cascade' })
  author!: User;

  @Property({ type: 'text' })
  body!: string;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @ManyToOne(() => User, { nullable: true, deleteRule: 'set null' })
  resolvedBy: User | null = null;

  @Property({ type: 'datetime', nullable: true })
  resolvedAt: Date | null = null;
}

/** A reply in a thread. */
@Entity({ tableName: 'comment_replies' })
export class CommentReply {
  [OptionalProps]?: 'createdAt';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @ManyToOne(() => CommentThread, { deleteRule: 'cascade' })
  thread!: CommentThread;

  @ManyToOne(() => User, { deleteRule: 'cascade' })
  author!: User;

  @Property({ type: 'text' })
  body!: string;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();
}

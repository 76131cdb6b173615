import { Entity, Index, ManyToOne, OptionalProps, PrimaryKey, Property } from '@mikro-orm/core';
import { randomUUID } from 'node:crypto';
import { CommentThread } from '../comments/comment.entity';
import { Notebook } from '../notebooks/notebook.entity';
import { User } from '../users/user.entity';

/**
 * Something a person should look at: so far, being @-mentioned in a comment.
 * It goes with its thread: deleting the thread deletes what pointed at it.
 */
@Entity({ tableName: 'notifications' })
@Index({ properties: ['recipient', 'createdAt'] })
export class Notification {
  [OptionalProps]?: 'createdAt' | 'readAt' | 'type';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @ManyToOne(() => User, { deleteRule: 'cascade' })
  recipient!: User;

  @Property({ type: 'string', length: 20 })
  type: 'mention' = 'mention';

  @ManyToOne(() => Notebook, { deleteRule: 'cascade' })
  notebook!: Notebook;

  @ManyToOne(() => CommentThread, { deleteRule: 'cascade' })
  thread!: CommentThread;

  @ManyToOne(() => User, { deleteRule: 'cascade' })
  by!: User;

  @Property({ type: 'string', length: 200 })
  excerpt!: string;

  @Property({ type: 'datetime', nullable: true })
  readAt: Date | null = null;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();
}

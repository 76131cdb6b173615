import { Entity, Index, ManyToOne, OptionalProps, PrimaryKey, Property } from '@mikro-orm/core';
import { randomUUID } from 'node:crypto';
import { Notebook } from '../notebooks/notebook.entity';
import { User } from '../users/user.entity';

/**
 * A named point in a notebook's version history: the whole Yjs state of the
 * document when someone named it, so it can be restored later.
 */
@Entity({ tableName: 'notebook_checkpoints' })
@Index({ properties: ['notebook', 'createdAt'] })
export class Checkpoint {
  [OptionalProps]?: 'createdAt';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @ManyToOne(() => Notebook, { deleteRule: 'cascade' })
  notebook!: Notebook;

  @Property({ type: 'string', length: 120 })
  name!: string;

  /** Y.encodeStateAsUpdate of the document as it stood. */
  @Property({ type: 'blob', lazy: true })
  state!: Buffer;

  @ManyToOne(() => User, { nullable: true, deleteRule: 'set null' })
  createdBy: User | null = null;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();
}

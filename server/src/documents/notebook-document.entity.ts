import { Entity, ManyToOne, OneToOne, OptionalProps, PrimaryKey, Property } from '@mikro-orm/core';
import { Notebook } from '../notebooks/notebook.entity';
import { User } from '../users/user.entity';

/**
 * A notebook's document as Yjs state: `state` is the merged update of
 * everything compacted so far; later updates wait in the update log until the
 * next compaction folds them in. JSON and plain text renderings are kept
 * beside it for search, snapshots and export.
 */
@Entity({ tableName: 'notebook_documents' })
export class NotebookDocument {
  [OptionalProps]?: 'updatedAt' | 'json' | 'text' | 'compactedThrough';

  @OneToOne(() => Notebook, { primary: true, owner: true, deleteRule: 'cascade' })
  notebook!: Notebook;

  @Property({ type: 'blob' })
  state!: Buffer;

  /** Id of the last update-log entry folded into `state`. */
  @Property({ type: 'integer', default: 0 })
  compactedThrough: number = 0;

  /** ProseMirror JSON of the document at the last save. */
  @Property({ type: 'json', nullable: true, lazy: true })
  json: Record<string, unknown> | null = null;

  /** Plain text of the document at the last save, for search. */
  @Property({ type: 'text', default: '', lazy: true })
  text: string = '';

  @Property({ type: 'datetime' })
  updatedAt: Date = new Date();
}

/** One accepted Yjs update, stored before it is acknowledged or passed on. */
@Entity({ tableName: 'notebook_updates' })
export class NotebookUpdate {
  [OptionalProps]?: 'createdAt';

  @PrimaryKey({ type: 'integer', autoincrement: true })
  id!: number;

  @ManyToOne(() => Notebook, { deleteRule: 'cascade' })
  notebook!: Notebook;

  @Property({ type: 'blob' })
  update!: Buffer;

  @ManyToOne(() => User, { nullable: true, deleteRule: 'set null' })
  author: User | null = null;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();
}

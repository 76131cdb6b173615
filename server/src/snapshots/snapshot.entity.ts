import { Entity, Index, ManyToOne, OptionalProps, PrimaryKey, Property, Unique } from '@mikro-orm/core';
import { randomUUID } from 'node:crypto';
import { Notebook } from '../notebooks/notebook.entity';
import { User } from '../users/user.entity';

/**
 * A published, read-only snapshot of a notebook: the document and every live figure and number
 * frozen at publishing, stored once as canonical JSON (`payload`) and never recomputed, so the
 * snapshot reads the same forever even as its series get new versions. No route changes a row.
 */
@Entity({ tableName: 'notebook_snapshots' })
@Unique({ properties: ['notebook', 'number'] })
export class Snapshot {
  [OptionalProps]?: 'publishedAt';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @ManyToOne(() => Notebook, { deleteRule: 'cascade' })
  notebook!: Notebook;

  /** 1, 2, … within the notebook. */
  @Property({ type: 'integer' })
  number!: number;

  @Property({ type: 'string', length: 200 })
  title!: string;

  @Property({ type: 'text', default: '' })
  releaseNote: string = '';

  @ManyToOne(() => User, { nullable: true, deleteRule: 'set null' })
  publishedBy: User | null = null;

  @Property({ type: 'datetime' })
  publishedAt: Date = new Date();

  @Property({ type: 'string', length: 40 })
  engineVersion!: string;

  @Property({ type: 'integer' })
  editorSchemaVersion!: number;

  @Property({ type: 'integer' })
  figureCount!: number;

  @Property({ type: 'integer' })
  numberCount!: number;

  /** Canonical JSON of the frozen content (notebookTitle, groupId, groupName, document, figures, numbers). */
  @Property({ type: 'text', lazy: true })
  payload!: string;

  /** sha256 (hex) of the payload's UTF-8 bytes. */
  @Property({ type: 'string', length: 64 })
  contentSha256!: string;
}

/** A public link to one snapshot; only the sha256 of its token is kept. */
@Entity({ tableName: 'snapshot_share_links' })
@Index({ properties: ['snapshot', 'createdAt'] })
export class ShareLink {
  [OptionalProps]?: 'createdAt' | 'expiresAt' | 'revokedAt';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @ManyToOne(() => Snapshot, { deleteRule: 'cascade' })
  snapshot!: Snapshot;

  /** sha256 (hex) of the token's text. */
  @Property({ type: 'string', length: 64, unique: true })
  tokenSha256!: string;

  /** The token's last 4 characters, so its owner can tell links apart. */
  @Property({ type: 'string', length: 8 })
  tokenHint!: string;

  @ManyToOne(() => User, { nullable: true, deleteRule: 'set null' })
  createdBy: User | null = null;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', nullable: true })
  expiresAt: Date | null = null;

  @Property({ type: 'datetime', nullable: true })
  revokedAt: Date | null = null;
}

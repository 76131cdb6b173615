import { Entity, Enum, ManyToOne, OptionalProps, PrimaryKey, Property, Unique } from '@mikro-orm/core';
import { randomUUID } from 'node:crypto';
import { DATA_ORIGINS, SERIES_KINDS, type DataOrigin, type SeriesKind, type SeriesTransform } from '@upwell/common';
import { Group } from '../groups/group.entity';
import { UploadedFile } from '../uploads/uploaded-file.entity';
import { User } from '../users/user.entity';

/** A stored monthly series of a group: an index, an inventory, a budget term... */
@Entity({ tableName: 'series' })
export class Series {
  [OptionalProps]?: 'variable' | 'units' | 'region' | 'depthLayer' | 'source' | 'notes' | 'origin' | 'createdAt' | 'updatedAt' | 'latestVersion';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @ManyToOne(() => Group, { deleteRule: 'cascade' })
  group!: Group;

  @Property({ type: 'string', length: 160 })
  name!: string;

  @Enum({ items: () => SERIES_KINDS as unknown as string[], type: 'string' })
  kind!: SeriesKind;

  @Property({ type: 'string', length: 200, default: '' })
  variable: string = '';

  @Property({ type: 'string', length: 200, default: '' })
  units: string = '';

  @Property({ type: 'string', length: 200, default: '' })
  region: string = '';

  @Property({ type: 'string', length: 200, default: '' })
  depthLayer: string = '';

  @Property({ type: 'string', length: 200, default: '' })
  source: string = '';

  @Enum({ items: () => DATA_ORIGINS as unknown as string[], type: 'string', default: 'unspecified' })
  origin: DataOrigin = 'unspecified';

  @Property({ type: 'text', default: '' })
  notes: string = '';

  /** Number of the newest version (0 before the first). */
  @Property({ type: 'integer', default: 0 })
  latestVersion: number = 0;

  @ManyToOne(() => User)
  createdBy!: User;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime' })
  updatedAt: Date = new Date();
}

/**
 * One immutable version of a series' values. Values are a Float64 little-endian
 * blob with NaN for a missing month; `valuesSha256` is the hash of those bytes.
 */
@Entity({ tableName: 'series_versions' })
@Unique({ properties: ['series', 'number'] })
export class SeriesVersion {
  [OptionalProps]?: 'createdAt' | 'note' | 'file' | 'transform' | 'calendar';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @ManyToOne(() => Series, { deleteRule: 'cascade' })
  series!: Series;

  @Property({ type: 'integer' })
  number!: number;

  @Property({ type: 'string', length: 7 })
  start!: string;

  @Property({ type: 'integer' })
  length!: number;

  @Property({ type: 'integer' })
  missing!: number;

  @Property({ type: 'blob', lazy: true })
  values!: Buffer;

  @Property({ type: 'string', length: 64 })
  valuesSha256!: string;

  @ManyToOne(() => UploadedFile, { nullable: true, deleteRule: 'set null' })
  file: UploadedFile | null = null;

  @Property({ type: 'json', nullable: true })
  transform: SeriesTransform | null = null;

  @Property({ type: 'text', default: '' })
  note: string = '';

  /** CF calendar of the months (canonical name, CF 1.11 §4.4.1): month lengths for integrals and day-weighted means. */
  @Property({ type: 'string', length: 20, default: 'standard' })
  calendar: string = 'standard';

  @ManyToOne(() => User)
  createdBy!: User;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();
}

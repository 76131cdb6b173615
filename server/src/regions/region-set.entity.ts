import { Entity, ManyToOne, OptionalProps, PrimaryKey, Property, Unique } from '@mikro-orm/core';
import { randomUUID } from 'node:crypto';
import { Group } from '../groups/group.entity';
import { UploadedFile } from '../uploads/uploaded-file.entity';
import { User } from '../users/user.entity';

/** A named set of regions of a group (basins from a model mask, drawn polygons, the Niño boxes), kept in versions. */
@Entity({ tableName: 'region_sets' })
export class RegionSet {
  [OptionalProps]?: 'createdAt' | 'latestVersion';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @ManyToOne(() => Group, { deleteRule: 'cascade' })
  group!: Group;

  @Property({ type: 'string', length: 160 })
  name!: string;

  @Property({ type: 'integer', default: 0 })
  latestVersion: number = 0;

  @ManyToOne(() => User)
  createdBy!: User;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();
}

/** The region kinds a version can hold. */
export type RegionSetKind = 'mask' | 'geojson' | 'standard-boxes';

/** One region of a version. */
export interface StoredRegion {
  name: string;
  code: number | null;
  cells: number | null;
}

/** One immutable version of a region set. */
@Entity({ tableName: 'region_set_versions' })
@Unique({ properties: ['regionSet', 'number'] })
export class RegionSetVersion {
  [OptionalProps]?: 'createdAt' | 'file' | 'grid' | 'codes';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @ManyToOne(() => RegionSet, { deleteRule: 'cascade' })
  regionSet!: RegionSet;

  @Property({ type: 'integer' })
  number!: number;

  @Property({ type: 'string', length: 20 })
  kind!: RegionSetKind;

  @Property({ type: 'json' })
  regions!: StoredRegion[];

  /** mask: { uploadId, variable }; geojson: the FeatureCollection; standard-boxes: { boxIds }. */
  @Property({ type: 'json' })
  definition!: Record<string, unknown>;

  /** The horizontal grid of a mask: dimension names and shape. */
  @Property({ type: 'json', nullable: true })
  grid: { dims: string[]; shape: number[] } | null = null;

  /** A mask's region codes, Float64 little-endian, one per cell (NaN: no region). */
  @Property({ type: 'blob', nullable: true, lazy: true })
  codes: Buffer | null = null;

  @ManyToOne(() => UploadedFile, { nullable: true })
  file: UploadedFile | null = null;

  @ManyToOne(() => User)
  createdBy!: User;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();
}

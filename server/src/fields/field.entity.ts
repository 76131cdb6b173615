import { Entity, ManyToOne, OptionalProps, PrimaryKey, Property } from '@mikro-orm/core';
import { randomUUID } from 'node:crypto';
import { Group } from '../groups/group.entity';
import { UploadedFile } from '../uploads/uploaded-file.entity';
import { User } from '../users/user.entity';

/**
 * A gridded variable of an uploaded NetCDF file, (time, lat, lon) or
 * (time, depth, lat, lon). The values stay in the file; reductions read it.
 */
@Entity({ tableName: 'gridded_fields' })
export class GriddedField {
  [OptionalProps]?: 'createdAt' | 'units' | 'longName';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @ManyToOne(() => Group, { deleteRule: 'cascade' })
  group!: Group;

  @ManyToOne(() => UploadedFile)
  file!: UploadedFile;

  @Property({ type: 'string', length: 200 })
  variable!: string;

  @Property({ type: 'string', length: 200, default: '' })
  longName: string = '';

  @Property({ type: 'string', length: 200, default: '' })
  units: string = '';

  /** Dimension names in file order, e.g. ["time", "lat", "lon"]. */
  @Property({ type: 'json' })
  dims!: string[];

  @Property({ type: 'json' })
  shape!: number[];

  /** First month of the time axis, "YYYY-MM". */
  @Property({ type: 'string', length: 7 })
  start!: string;

  /** Latitude and longitude extent: [south, north, west, east] in degrees. */
  @Property({ type: 'json' })
  extent!: [number, number, number, number];

  @ManyToOne(() => User)
  createdBy!: User;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();
}

/**
 * A zonal mean over a longitude band: time × latitude values for
 * time–latitude (Hovmöller) diagrams, with how it was made.
 */
@Entity({ tableName: 'zonal_mean_fields' })
export class ZonalMeanField {
  [OptionalProps]?: 'createdAt';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @ManyToOne(() => Group, { deleteRule: 'cascade' })
  group!: Group;

  @ManyToOne(() => GriddedField, { deleteRule: 'cascade' })
  source!: GriddedField;

  @Property({ type: 'string', length: 160 })
  name!: string;

  @Property({ type: 'string', length: 7 })
  start!: string;

  @Property({ type: 'integer' })
  months!: number;

  /** Latitude centres, south to north. */
  @Property({ type: 'json' })
  latitudes!: number[];

  /** Float64 little-endian, time-major (months × latitudes), NaN where missing. */
  @Property({ type: 'blob', lazy: true })
  values!: Buffer;

  @Property({ type: 'string', length: 200 })
  units!: string;

  /** How it was made: variable, longitude band, depth range, weighting. */
  @Property({ type: 'json' })
  provenance!: Record<string, unknown>;

  @ManyToOne(() => User)
  createdBy!: User;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();
}

import { Entity, Enum, ManyToOne, OptionalProps, PrimaryKey, Property } from '@mikro-orm/core';
import { randomUUID } from 'node:crypto';
import { Group } from '../groups/group.entity';
import { User } from '../users/user.entity';

/** Formats Upwell reads. */
export const UPLOAD_FORMATS = ['csv', 'netcdf-classic', 'netcdf4'] as const;
export type UploadFormat = (typeof UPLOAD_FORMATS)[number];

/**
 * A file someone uploaded, kept in DATA_DIR/uploads as it arrived so every
 * version made from it can be traced back to the exact bytes.
 */
@Entity({ tableName: 'uploaded_files' })
export class UploadedFile {
  [OptionalProps]?: 'createdAt' | 'importedAt' | 'options';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @ManyToOne(() => Group, { deleteRule: 'cascade' })
  group!: Group;

  /** The name the file had on the uploader's machine, cleaned of any path. */
  @Property({ type: 'string', length: 255 })
  originalName!: string;

  @Property({ type: 'string', length: 64 })
  sha256!: string;

  @Property({ type: 'integer' })
  size!: number;

  @Enum({ items: () => UPLOAD_FORMATS as unknown as string[], type: 'string' })
  format!: UploadFormat;

  /** Path relative to DATA_DIR. */
  @Property({ type: 'string', length: 255 })
  storedPath!: string;

  /** The reading options the preview used, so the import reads the file the same way. */
  @Property({ type: 'json', nullable: true })
  options: Record<string, unknown> | null = null;

  @ManyToOne(() => User)
  uploadedBy!: User;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  /** Set once series were made from it; staged files without it are previews only. */
  @Property({ type: 'datetime', nullable: true })
  importedAt: Date | null = null;
}

import { DefaultLogger, defineConfig, type LogContext, type LoggerNamespace, type LoggerOptions, type Options } from '@mikro-orm/sqlite';
import { Migrator } from '@mikro-orm/migrations';
import { join, resolve } from 'node:path';
import { User } from './users/user.entity';
import { Group, GroupMembership } from './groups/group.entity';
import { Notebook, NotebookRoleAssignment } from './notebooks/notebook.entity';
import { Series, SeriesVersion } from './series/series.entity';
import { UploadedFile } from './uploads/uploaded-file.entity';
import { GriddedField, ZonalMeanField } from './fields/field.entity';
import { RegionSet, RegionSetVersion } from './regions/region-set.entity';
import { NotebookDocument, NotebookUpdate } from './documents/notebook-document.entity';
import { EventSet } from './event-sets/event-set.entity';
import { Checkpoint } from './checkpoints/checkpoint.entity';
import { CommentReply, CommentThread } from './comments/comment.entity';
import { Notification } from './notifications/notification.entity';
import { migrationsList } from './migrations';
import { ShareLink, Snapshot } from './snapshots/snapshot.entity';
import { Invitation } from './invitations/invitation.entity';

/** Every entity the server stores; new modules add theirs here. */
export const ENTITIES = [User, Group, GroupMembership, Notebook, NotebookRoleAssignment, UploadedFile, Series, SeriesVersion, GriddedField, ZonalMeanField, NotebookDocument, NotebookUpdate, EventSet, Checkpoint, CommentThread, CommentReply, Notification,
  // Snapshots
  Snapshot, ShareLink,
  // E-mail invitations
  Invitation,
  // Region sets on native model grids
  RegionSet, RegionSetVersion];

/**
 * MikroORM's logger with parameter logging locked off: should query logging
 * ever be turned on (`debug`), statements show `?` placeholders, never the
 * values (e-mails, password hashes) that MikroORM otherwise inlines.
 */
export class LoggerWithoutParams extends DefaultLogger {
  constructor(options: LoggerOptions) {
    super(options);
  }

  override isEnabled(namespace: LoggerNamespace, context?: LogContext): boolean {
    return namespace !== 'query-params' && super.isEnabled(namespace, context);
  }
}

/** MikroORM options for the SQLite file at `databaseFile`. */
export function buildOrmOptions(databaseFile: string): Options {
  return defineConfig({
    dbName: databaseFile,
    entities: ENTITIES,
    extensions: [Migrator],
    // Migrations are listed explicitly so the built server never scans or compiles TypeScript.
    migrations: { migrationsList, path: join(__dirname, 'migrations'), pathTs: resolve(__dirname, '../src/migrations'), transactional: true, snapshot: false, silent: true },
    pool: {
      // One writer at a time in SQLite: WAL lets readers go on while it writes,
      // the busy timeout makes a second writer wait instead of failing at once.
      afterCreate: (conn: { run: (sql: string, cb: (err: Error | null) => void) => void }, done: (err: Error | null, conn: unknown) => void) => {
        conn.run('PRAGMA journal_mode = WAL', (err) => {
          if (err) return done(err, conn);
          conn.run('PRAGMA busy_timeout = 5000', (err2) => {
            if (err2) return done(err2, conn);
            conn.run('PRAGMA foreign_keys = ON', (err3) => done(err3, conn));
          });
        });
      },
    },
    debug: false,
    loggerFactory: (options) => new LoggerWithoutParams(options),
  });
}

// The MikroORM CLI (npm run migration:create -w server) reads this default export.
export default buildOrmOptions(join(resolve(process.env.DATA_DIR || './data'), 'upwell.sqlite'));

import { SqliteDriver } from '@mikro-orm/sqlite';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module, type DynamicModule } from '@nestjs/common';
import { ConfigModule, ConfigService } from '@nestjs/config';
import { ServeStaticModule } from '@nestjs/serve-static';
import { AnalysisModule } from './analysis/analysis.module';
import { AuthModule } from './auth/auth.module';
import { APP_CONFIG, type AppConfig } from './config/app-config';
import { MigrateOnStart } from './database/migrate-on-start';
import { GroupsModule } from './groups/groups.module';
import { HealthController } from './health/health.controller';
import { buildOrmOptions } from './mikro-orm.config';
import { NotebooksModule } from './notebooks/notebooks.module';
import { UsersModule } from './users/users.module';
import { RealtimeModule } from './realtime/realtime.module';
import { SeriesModule } from './series/series.module';
import { UploadsModule } from './uploads/uploads.module';
import { FieldsModule } from './fields/fields.module';
import { JobsModule } from './jobs/jobs.module';
import { RegionsModule } from './regions/regions.module';
import { FiguresModule } from './figures/figures.module';
import { EventSetsModule } from './event-sets/event-sets.module';
import { CollaborationModule } from './collaboration/collaboration.module';
import { CheckpointsModule } from './checkpoints/checkpoints.module';
import { CommentsModule } from './comments/comments.module';
import { NotificationsModule } from './notifications/notifications.module';
import { EventEmitterModule } from '@nestjs/event-emitter';
import { SnapshotsModule } from './snapshots/snapshots.module';
// Notebook files and the demo (issue 8)
import { NotebookFilesModule } from './notebook-files/notebook-files.module';
import { DemoModule } from './demo/demo.module';
// E-mail and invitations.
import { MailModule } from './mail/mail.module';
import { InvitationsModule } from './invitations/invitations.module';

/** The whole server, built for one resolved configuration. */
@Module({})
export class AppModule {
  static forConfig(config: AppConfig): DynamicModule {
    return {
      module: AppModule,
      imports: [
        ConfigModule.forRoot({ isGlobal: true, ignoreEnvFile: true, load: [() => ({ [APP_CONFIG]: config })] }),
        MikroOrmModule.forRootAsync({
          inject: [ConfigService],
          useFactory: (cfg: ConfigService) => buildOrmOptions(cfg.getOrThrow<AppConfig>(APP_CONFIG).databaseFile),
          driver: SqliteDriver,
        }),
        ...(config.webDist
          ? [ServeStaticModule.forRoot({ rootPath: config.webDist, exclude: ['/api{/*path}', '/socket.io{/*path}'] })]
          : []),
        JobsModule,
        AuthModule,
        UsersModule,
        GroupsModule,
        NotebooksModule,
        RealtimeModule,
        SeriesModule,
        AnalysisModule,
        UploadsModule,
        FieldsModule,
        FiguresModule,
        EventSetsModule,
        CollaborationModule,
        CheckpointsModule,
        CommentsModule,
        NotificationsModule,
        // Snapshots (and the in-process events they emit)
        EventEmitterModule.forRoot(),
        SnapshotsModule,
        NotebookFilesModule,
        DemoModule,
        // E-mail and invitations.
        MailModule,
        InvitationsModule,
        // Region sets and regional budgets on native model grids.
        RegionsModule,
      ],
      controllers: [HealthController],
      providers: [MigrateOnStart],
    };
  }
}

import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { MulterModule } from '@nestjs/platform-express';
import { join } from 'node:path';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { GroupsModule } from '../groups/groups.module';
import { SeriesModule } from '../series/series.module';
import { hashingDiskStorage } from './hashing-disk-storage';
import { UploadsController } from './uploads.controller';
import { UploadsService } from './uploads.service';
import { UploadQuotas } from './upload-quotas';
import { UploadGateGuard } from './upload-gate.guard';
import { StagedUploadsSweeper } from './staged-uploads-sweeper';

@Module({
  imports: [
    GroupsModule,
    SeriesModule,
    MulterModule.registerAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService) => {
        const app = config.getOrThrow<AppConfig>(APP_CONFIG);
        return {
          storage: hashingDiskStorage(join(app.dataDir, 'uploads', 'tmp'), app.uploads.idleTimeoutMs),
          limits: { fileSize: app.uploadMaxBytes, files: 1, fields: 5, fieldSize: 64 * 1024, parts: 8 },
          // Browsers send the file name as raw UTF-8 (HTML's multipart/form-data encoding); busboy's default reads it as Latin-1.
          defParamCharset: 'utf8',
        };
      },
    }),
  ],
  controllers: [UploadsController],
  providers: [UploadsService, UploadQuotas, UploadGateGuard, StagedUploadsSweeper],
})
export class UploadsModule {}

import { EntityManager } from '@mikro-orm/sqlite';
import { Injectable, Logger, type OnApplicationBootstrap, type OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { rm } from 'node:fs/promises';
import { join } from 'node:path';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { sweepStaleParts } from './hashing-disk-storage';
import { UploadedFile } from './uploaded-file.entity';

const EVERY_MS = 10 * 60 * 1000;

/**
 * Deletes staged uploads nothing was imported from once they are UPLOAD_STAGED_TTL_HOURS old
 * (row and file), and part files no upload is writing; at start and every ten minutes.
 */
@Injectable()
export class StagedUploadsSweeper implements OnApplicationBootstrap, OnApplicationShutdown {
  private timer: NodeJS.Timeout | null = null;
  private readonly config: AppConfig;
  private readonly logger = new Logger('Uploads');

  constructor(private readonly em: EntityManager, config: ConfigService) {
    this.config = config.getOrThrow<AppConfig>(APP_CONFIG);
  }

  async onApplicationBootstrap(): Promise<void> {
    await this.sweep().catch((err: unknown) => this.logger.error(`sweeping staged uploads failed: ${err instanceof Error ? err.message : err}`));
    this.timer = setInterval(() => void this.sweep().catch(() => undefined), EVERY_MS);
    this.timer.unref();
  }

  onApplicationShutdown(): void {
    if (this.timer) clearInterval(this.timer);
  }

  /** One pass; answers how many staged uploads and part files it removed. */
  async sweep(now = new Date()): Promise<{ uploads: number; parts: number }> {
    const parts = sweepStaleParts(join(this.config.dataDir, 'uploads', 'tmp'), this.config.uploads.idleTimeoutMs);
    const em = this.em.fork();
    const cutoff = new Date(now.getTime() - this.config.uploads.stagedTtlHours * 3600_000);
    const expired = await em.find(UploadedFile, { importedAt: null, createdAt: { $lt: cutoff } });
    for (const upload of expired) {
      em.remove(upload);
      await em.flush();
      await rm(join(this.config.dataDir, upload.storedPath), { force: true });
    }
    if (expired.length + parts > 0) this.logger.log(`removed ${expired.length} expired staged uploads and ${parts} abandoned part files`);
    return { uploads: expired.length, parts };
  }
}

import { MikroORM } from '@mikro-orm/sqlite';
import { Injectable, Logger, type OnModuleInit } from '@nestjs/common';

/** Brings the SQLite schema up to date before the app takes requests. */
@Injectable()
export class MigrateOnStart implements OnModuleInit {
  private readonly logger = new Logger('Database');

  constructor(private readonly orm: MikroORM) {}

  async onModuleInit(): Promise<void> {
    const applied = await this.orm.getMigrator().up();
    if (applied.length) this.logger.log(`applied migrations: ${applied.map((m) => m.name).join(', ')}`);
  }
}

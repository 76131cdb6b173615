import { EntityManager, MikroORM, RequestContext } from '@mikro-orm/sqlite';
import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { ModuleRef } from '@nestjs/core';
import type { DemoInfo } from '@upwell/common';
import { AuthService } from '../../auth/auth.service';
import { loggableError } from '../../common/loggable-error';
import { APP_CONFIG, type AppConfig } from '../../config/app-config';
import { Group, GroupMembership } from '../../groups/group.entity';
import { User } from '../../users/user.entity';
import { DEMO_GROUP_NAME, DEMO_PEOPLE, demoBanner } from '../demo-people';
import { seedDemoContent, type DemoCast } from './demo-content';

/**
 * Seeds the demo once, at start, when the config allows it (SEED_DEMO, loopback HOST) and the
 * database has no demo group yet; later starts only print the sign-in
 * details. A seed that fails is logged and leaves the server running.
 */
@Injectable()
export class DemoSeed implements OnApplicationBootstrap {
  private readonly logger = new Logger('Demo');
  private readonly config: AppConfig;

  constructor(
    private readonly orm: MikroORM,
    private readonly em: EntityManager,
    private readonly auth: AuthService,
    private readonly moduleRef: ModuleRef,
    config: ConfigService,
  ) {
    this.config = config.getOrThrow<AppConfig>(APP_CONFIG);
  }

  async onApplicationBootstrap(): Promise<void> {
    if (this.config.seedDemoRefused) {
      this.logger.warn(
        `not seeding the demo: its passwords are public and HOST=${this.config.host} is not a loopback address; SEED_DEMO=force seeds it anyway, SEED_DEMO=false silences this`,
      );
    }
    if (!this.config.seedDemo) return;
    try {
      await RequestContext.create(this.orm.em, () => this.run());
      process.stdout.write(`\n${demoBanner()}\n\n`);
    } catch (err) {
      this.logger.error(`the demo seed failed: ${loggableError(err)}`);
    }
  }

  /** Seeds unless the demo group exists; answers whether anything was created. */
  async run(): Promise<boolean> {
    if (await this.demoGroup()) return false;
    const started = Date.now();
    const cast = await this.people();
    await seedDemoContent({ moduleRef: this.moduleRef, em: this.em, dataDir: this.config.dataDir, cast, log: (m) => this.logger.log(m) });
    this.logger.log(`demo seeded in ${((Date.now() - started) / 1000).toFixed(1)} s`);
    return true;
  }

  /** The demo accounts, while the seed is in use and its people exist. */
  async info(): Promise<DemoInfo | null> {
    if (!this.config.seedDemo) return null;
    const lead = DEMO_PEOPLE[0];
    if (!(await this.em.fork().count(User, { email: lead.email }))) return null;
    return { enabled: true, groupName: DEMO_GROUP_NAME, people: DEMO_PEOPLE.map((p) => ({ ...p })) };
  }

  private async demoGroup(): Promise<Group | null> {
    const lead = await this.em.findOne(User, { email: DEMO_PEOPLE[0].email });
    if (!lead) return null;
    const m = await this.em.findOne(GroupMembership, { user: lead, group: { name: DEMO_GROUP_NAME } }, { populate: ['group'] });
    return m?.group ?? null;
  }

  /** The four demo people, signed up through the ordinary sign-up (or found, if an earlier seed stopped half-way). */
  private async people(): Promise<DemoCast> {
    const found: User[] = [];
    for (const p of DEMO_PEOPLE) {
      const existing = await this.em.findOne(User, { email: p.email });
      if (!existing) await this.auth.register({ email: p.email, name: p.name, password: p.password });
      found.push(existing ?? (await this.em.findOneOrFail(User, { email: p.email })));
    }
    const [lead, coAuthor, reviewer, reader] = found;
    return { lead, coAuthor, reviewer, reader };
  }
}

import { Module } from '@nestjs/common';
import { AuthModule } from '../auth/auth.module';
import { DemoController } from './demo.controller';
import { DemoSeed } from './seed/demo-seed.service';

/**
 * The demo: on start (unless SEED_DEMO=false) a group with four people,
 * invented model-output series uploaded through the app's own import, the two
 * example notebooks and open review threads. The seed reaches the feature
 * services through the module graph (ModuleRef), as a person would through
 * the routes, so their provenance and checks are the real ones.
 */
@Module({ imports: [AuthModule], controllers: [DemoController], providers: [DemoSeed] })
export class DemoModule {}

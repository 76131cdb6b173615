import { Global, Inject, Module, type OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { JobRunner } from './job-runner';
import { WorkerThreadJobRunner } from './worker-thread-job-runner';

/** Provides the `JobRunner` every module hands heavy work to: worker threads, JOB_WORKERS of them. */
@Global()
@Module({
  providers: [
    {
      provide: JobRunner,
      inject: [ConfigService],
      useFactory: (config: ConfigService) => new WorkerThreadJobRunner(config.getOrThrow<AppConfig>(APP_CONFIG).jobWorkers),
    },
  ],
  exports: [JobRunner],
})
export class JobsModule implements OnApplicationShutdown {
  constructor(@Inject(JobRunner) private readonly runner: JobRunner) {}

  async onApplicationShutdown(): Promise<void> {
    if (this.runner instanceof WorkerThreadJobRunner) await this.runner.close();
  }
}

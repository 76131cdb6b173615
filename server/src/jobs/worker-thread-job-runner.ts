import { Logger } from '@nestjs/common';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { Worker } from 'node:worker_threads';
import type { JobInput, JobKind, JobOutput, JobProgress } from './job-kinds';
import { messageToError, type JobReply, type JobRequest } from './job-messages';
import { JobRunner } from './job-runner';

interface Pending {
  request: JobRequest;
  onProgress?: JobProgress;
  resolve(output: unknown): void;
  reject(error: Error): void;
}

interface Slot {
  worker: Worker;
  job: Pending | null;
}

/**
 * Where the worker's entry lives: beside this file when running compiled (server/dist), else the
 * TypeScript sources through the small transpiling bootstrap (tests run the sources unbuilt).
 */
function workerEntry(): { file: string; workerData?: Record<string, string> } {
  const compiled = join(__dirname, 'job-worker.js');
  if (existsSync(compiled)) return { file: compiled };
  return {
    file: join(__dirname, 'ts-job-worker.cjs'),
    workerData: { entry: join(__dirname, 'job-worker.ts'), commonSrc: resolve(__dirname, '../../../common/src') },
  };
}

/**
 * A `JobRunner` over a fixed pool of worker threads (one per core by default), each running one
 * job at a time; more jobs wait in a first-come queue. Workers start on first use and stay. A
 * worker that dies (out of memory, a crash in native code) fails its job and is replaced.
 */
export class WorkerThreadJobRunner extends JobRunner {
  private readonly slots: Slot[] = [];
  private readonly queue: Pending[] = [];
  private nextId = 1;
  private closed = false;
  private readonly logger = new Logger('Jobs');

  constructor(private readonly size: number) {
    super();
    if (!Number.isInteger(size) || size < 1) throw new RangeError(`a job pool needs at least one worker, got ${size}`);
  }

  /** Jobs waiting for a free worker (for tests and health figures). */
  get waiting(): number {
    return this.queue.length;
  }

  run<K extends JobKind>(kind: K, input: JobInput<K>, onProgress?: JobProgress): Promise<JobOutput<K>> {
    if (this.closed) return Promise.reject(new Error('the job pool is shut down'));
    return new Promise<JobOutput<K>>((resolve, reject) => {
      this.queue.push({ request: { id: this.nextId++, kind, input }, onProgress, resolve: resolve as (o: unknown) => void, reject });
      this.dispatch();
    });
  }

  /** Stops every worker; queued and running jobs fail. */
  async close(): Promise<void> {
    this.closed = true;
    for (const p of this.queue.splice(0)) p.reject(new Error('the job pool is shut down'));
    await Promise.all(this.slots.splice(0).map((s) => {
      s.job?.reject(new Error('the job pool is shut down'));
      return s.worker.terminate();
    }));
  }

  private dispatch(): void {
    while (this.queue.length > 0) {
      let slot = this.slots.find((s) => !s.job);
      if (!slot && this.slots.length < this.size) slot = this.spawn();
      if (!slot) return;
      const job = this.queue.shift()!;
      slot.job = job;
      slot.worker.postMessage(job.request);
    }
  }

  private spawn(): Slot {
    const entry = workerEntry();
    const worker = new Worker(entry.file, { workerData: entry.workerData });
    // An idle pool does not keep the process alive; the HTTP server does while it runs.
    worker.unref();
    const slot: Slot = { worker, job: null };
    worker.on('message', (m: JobReply) => {
      const job = slot.job;
      if (!job || m.id !== job.request.id) return;
      if (m.type === 'progress') return job.onProgress?.(m.fraction);
      slot.job = null;
      if (m.type === 'done') job.resolve(m.output);
      else job.reject(messageToError(m.error));
      this.dispatch();
    });
    const lost = (error: Error) => {
      const index = this.slots.indexOf(slot);
      if (index < 0) return;
      this.slots.splice(index, 1);
      if (slot.job) {
        this.logger.error(`a job worker stopped during a ${slot.job.request.kind} job: ${error.message}`);
        slot.job.reject(new Error(`the ${slot.job.request.kind} job stopped unexpectedly`));
        slot.job = null;
      }
      if (!this.closed) this.dispatch();
    };
    worker.on('error', lost);
    worker.on('exit', (code) => lost(new Error(`exit code ${code}`)));
    this.slots.push(slot);
    return slot;
  }
}

import type { JobInput, JobKind, JobOutput, JobProgress } from './job-kinds';

/**
 * Runs heavy work away from the server's event loop. Services depend on this abstract class
 * only; today's runner is a pool of worker threads in this process (`WorkerThreadJobRunner`),
 * and a queue-backed runner can replace it without touching a caller. A job's failure comes back
 * as the error it threw (a `NetcdfImportError` keeps its code and place).
 */
export abstract class JobRunner {
  /** Runs one job of `kind` and answers its output; `onProgress` hears 0..1 as it goes. */
  abstract run<K extends JobKind>(kind: K, input: JobInput<K>, onProgress?: JobProgress): Promise<JobOutput<K>>;
}

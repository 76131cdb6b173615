import { parentPort } from 'node:worker_threads';
import { JOB_HANDLERS, type JobHandler } from './job-handlers';
import type { JobKind } from './job-kinds';
import { errorToMessage, type JobReply, type JobRequest } from './job-messages';

// Entry point of a job worker thread: runs one job at a time as the pool sends them.
const port = parentPort;
if (!port) throw new Error('job-worker runs as a worker thread only');

port.on('message', async ({ id, kind, input }: JobRequest) => {
  const reply = (m: JobReply) => port.postMessage(m);
  try {
    const handler = JOB_HANDLERS[kind] as JobHandler<JobKind> | undefined;
    if (!handler) throw new Error(`no job kind "${kind}"`);
    const output = await handler(input as never, (fraction) => reply({ id, type: 'progress', fraction }));
    reply({ id, type: 'done', output });
  } catch (error) {
    reply({ id, type: 'failed', error: errorToMessage(error) });
  }
});

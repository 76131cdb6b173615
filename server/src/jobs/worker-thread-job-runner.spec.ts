import { afterAll, describe, expect, it } from 'vitest';
import { fixture } from '../../test/fixtures/netcdf/fixture-path';
import { DEFAULT_NETCDF_LIMITS, describeNetcdf, NetcdfImportError, openNetcdf } from '../series/netcdf';
import { presentNetcdfPreview } from '../uploads/netcdf-preview.presenter';
import { WorkerThreadJobRunner } from './worker-thread-job-runner';

// Under vitest the pool runs the TypeScript sources through ts-job-worker.cjs; the built server
// runs dist/jobs/job-worker.js (checked by server/test/heavy-work.e2e.spec.ts against server/dist).
describe('WorkerThreadJobRunner', () => {
  const runner = new WorkerThreadJobRunner(2);
  afterAll(() => runner.close());
  const limits = DEFAULT_NETCDF_LIMITS;

  it('answers a preview computed in a worker thread equal to the same preview computed here', async () => {
    const path = fixture('series-classic.nc');
    const here = await openNetcdf(path);
    const expected = presentNetcdfPreview(describeNetcdf(here));
    here.close();
    expect(await runner.run('netcdf-preview', { path, limits })).toEqual(expected);
  });

  it('gives back a NetcdfImportError with its code and place, and the pool keeps working', async () => {
    const failure = await runner.run('netcdf-preview', { path: fixture('wrong-magic.nc'), limits }).catch((e: unknown) => e);
    expect(failure).toBeInstanceOf(NetcdfImportError);
    expect((failure as NetcdfImportError).code).toBe('not-netcdf');
    const series = await runner.run('netcdf-series', { path: fixture('series-classic.nc'), limits, variables: ['enso_index'] });
    expect(series[0].values.length).toBe(24);
  });

  it('runs more jobs than workers by queueing them, each answered', async () => {
    const path = fixture('field-sinlat.nc');
    const jobs = Array.from({ length: 5 }, () => runner.run('netcdf-fields', { path, limits }));
    const answers = await Promise.all(jobs);
    for (const a of answers) expect(a.fields.length).toBeGreaterThan(0);
  });
});

import { describe, expect, it } from 'vitest';
import { parseDemoCliArgs } from './cli-args';
import { DEMO_SEED } from './random-stream';

describe('parseDemoCliArgs()', () => {
  it('takes a directory, release 1 and the demo seed by default', () => {
    expect(parseDemoCliArgs(['out'])).toEqual({ dir: 'out', release: 1, seed: DEMO_SEED });
  });

  it('reads --release and --seed in any position', () => {
    expect(parseDemoCliArgs(['--release', '2', 'out', '--seed', '7'])).toEqual({ dir: 'out', release: 2, seed: 7 });
  });

  it('says what is wrong with bad arguments', () => {
    expect(() => parseDemoCliArgs([])).toThrow(/usage: cli.js <dir>/);
    expect(() => parseDemoCliArgs(['out', 'more'])).toThrow(/usage/);
    expect(() => parseDemoCliArgs(['out', '--release', '3'])).toThrow('--release must be 1 or 2, got 3');
    expect(() => parseDemoCliArgs(['out', '--seed', '1.5'])).toThrow('--seed must be a whole number, got 1.5');
    expect(() => parseDemoCliArgs(['out', '--seed'])).toThrow(/--seed needs a value/);
  });
});

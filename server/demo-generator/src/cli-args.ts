import type { DemoRelease } from './demo-scenario';
import { DEMO_SEED } from './random-stream';

/** Parsed arguments of the demo CLI. */
export interface DemoCliArgs {
  dir: string;
  release: DemoRelease;
  seed: number;
}

const USAGE = 'usage: cli.js <dir> [--release 1|2] [--seed N]';

/** Reads `<dir> [--release 1|2] [--seed N]`; a clear error names what was wrong. */
export function parseDemoCliArgs(argv: string[]): DemoCliArgs {
  const args = [...argv];
  const option = (name: string): string | undefined => {
    const at = args.indexOf(name);
    if (at < 0) return undefined;
    const [, value] = args.splice(at, 2);
    if (value === undefined || value.startsWith('--')) throw new Error(`${name} needs a value; ${USAGE}`);
    return value;
  };
  const release = Number(option('--release') ?? '1');
  const seedText = option('--seed');
  if (release !== 1 && release !== 2) throw new Error(`--release must be 1 or 2, got ${release}`);
  const seed = seedText === undefined ? DEMO_SEED : Number(seedText);
  if (seedText !== undefined && !/^\d+$/.test(seedText)) throw new Error(`--seed must be a whole number, got ${seedText}`);
  if (args.length !== 1 || args[0].startsWith('--')) throw new Error(USAGE);
  return { dir: args[0], release, seed };
}

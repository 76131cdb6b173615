import { resolve } from 'node:path';
import { writeDemoFiles } from './write-demo-files';
import { DEMO_SEED } from './random-stream';

/**
 * Writes the demo files: `node server/dist/demo/generator/cli.js <dir> [--release 1|2] [--seed N]`.
 * Prints the manifest.
 */
async function main(argv: string[]): Promise<void> {
  const args = [...argv];
  const option = (name: string): string | undefined => {
    const at = args.indexOf(name);
    if (at < 0) return undefined;
    const [, value] = args.splice(at, 2);
    if (value === undefined) throw new Error(`${name} needs a value`);
    return value;
  };
  const release = Number(option('--release') ?? '1');
  const seed = Number(option('--seed') ?? String(DEMO_SEED));
  if (release !== 1 && release !== 2) throw new Error(`--release must be 1 or 2, got ${release}`);
  if (!Number.isInteger(seed)) throw new Error(`--seed must be an integer, got ${seed}`);
  if (args.length !== 1 || args[0].startsWith('--')) throw new Error('usage: cli.js <dir> [--release 1|2] [--seed N]');
  const manifest = await writeDemoFiles(resolve(args[0]), { release, seed });
  process.stdout.write(`${JSON.stringify(manifest, null, 2)}\n`);
}

main(process.argv.slice(2)).catch((error: unknown) => {
  process.stderr.write(`${error instanceof Error ? error.message : String(error)}\n`);
  process.exitCode = 1;
});

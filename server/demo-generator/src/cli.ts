#!/usr/bin/env node
import { resolve } from 'node:path';
import { parseDemoCliArgs } from './cli-args';
import { writeDemoFiles } from './write-demo-files';

// Writes the demo files and prints the manifest:
// node server/demo-generator/dist/cli.js <dir> [--release 1|2] [--seed N]
async function main(argv: string[]): Promise<void> {
  const { dir, release, seed } = parseDemoCliArgs(argv);
  const manifest = await writeDemoFiles(resolve(dir), { release, seed });
  process.stdout.write(`${JSON.stringify(manifest, null, 2)}\n`);
}

main(process.argv.slice(2)).catch((error: unknown) => {
  process.stderr.write(`${error instanceof Error ? error.message : String(error)}\n`);
  process.exitCode = 1;
});

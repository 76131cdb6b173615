// `npm test` after the build: every vitest project; with VITEST_JSON set, also a JSON report for CI's closing line.
import { spawnSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';

const args = ['vitest', 'run', ...process.argv.slice(2)];
if (process.env.VITEST_JSON) {
  mkdirSync(dirname(process.env.VITEST_JSON), { recursive: true });
  args.push('--reporter=default', '--reporter=json', `--outputFile.json=${process.env.VITEST_JSON}`);
}
const r = spawnSync('npx', args, { stdio: 'inherit' });
process.exit(r.status ?? 1);

// `npm start`: build whatever is missing or older than its sources, then serve
// the API and the built web app on one port (PORT, default 3000).
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';

const root = new URL('..', import.meta.url).pathname;

function newest(dir, skip = new Set(['node_modules', 'dist'])) {
  let t = 0;
  if (!existsSync(dir)) return t;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    if (skip.has(entry.name)) continue;
    const p = join(dir, entry.name);
    t = Math.max(t, entry.isDirectory() ? newest(p, skip) : statSync(p).mtimeMs);
  }
  return t;
}

const parts = [
  { name: 'common', src: ['common/src'], out: 'common/dist/index.js' },
  { name: '@upwell/demo-generator', src: ['server/demo-generator/src', 'common/src'], out: 'server/demo-generator/dist/index.js' },
  { name: '@upwell/server', src: ['server/src', 'server/demo-generator/src', 'common/src'], out: 'server/dist/main.js' },
  { name: 'web', src: ['web/src', 'web/index.html', 'common/src'], out: 'web/dist/index.html' },
];
for (const part of parts) {
  const out = join(root, part.out);
  const srcTime = Math.max(...part.src.map((s) => (statSync(join(root, s)).isDirectory() ? newest(join(root, s)) : statSync(join(root, s)).mtimeMs)));
  if (existsSync(out) && statSync(out).mtimeMs >= srcTime) continue;
  console.log(`[upwell] building ${part.name} …`);
  const r = spawnSync('npm', ['run', 'build', '-w', part.name], { cwd: root, stdio: 'inherit' });
  if (r.status !== 0) process.exit(r.status ?? 1);
}

const server = spawn(process.execPath, [join(root, 'server/dist/main.js')], { cwd: root, stdio: 'inherit', env: process.env });
for (const sig of ['SIGINT', 'SIGTERM']) process.on(sig, () => server.kill(sig));
server.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));

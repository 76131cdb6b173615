// `npm run dev`: the server rebuilt on change (port 3000) and Vite's dev server
// (port 5173) proxying /api and /socket.io to it.
import { spawn, spawnSync } from 'node:child_process';

const root = new URL('..', import.meta.url).pathname;
const build = spawnSync('npm', ['run', 'build', '-w', 'common'], { cwd: root, stdio: 'inherit' });
if (build.status !== 0) process.exit(build.status ?? 1);

const children = [
  spawn('npx', ['nest', 'start', '--watch'], { cwd: `${root}/server`, stdio: 'inherit', env: { ...process.env, WEB_DIST: '' } }),
  spawn('npx', ['vite'], { cwd: `${root}/web`, stdio: 'inherit' }),
];
const stop = () => children.forEach((c) => c.kill('SIGTERM'));
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
children.forEach((c) => c.on('exit', stop));

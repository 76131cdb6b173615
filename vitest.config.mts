import { defineConfig } from 'vitest/config';
import { fileURLToPath } from 'node:url';

const commonSrc = fileURLToPath(new URL('./common/src/index.ts', import.meta.url));
// Tests read @upwell/common from its source, so they need no build of it.
const alias = { '@upwell/common': commonSrc };

export default defineConfig({
  test: {
    projects: [
      { resolve: { alias }, test: { name: 'common', include: ['common/src/**/*.test.ts'], environment: 'node' } },
      // The engine runs in the browser too: the same tests under a DOM environment.
      { resolve: { alias }, test: { name: 'common-dom', include: ['common/src/**/*.test.ts'], environment: 'happy-dom' } },
      {
        resolve: { alias },
        test: {
          name: 'server',
          include: ['server/src/**/*.spec.ts', 'server/test/**/*.spec.ts'],
          environment: 'node',
          testTimeout: 30_000,
          hookTimeout: 60_000,
          setupFiles: ['server/test/setup.ts'],
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'web',
          include: ['web/src/**/*.test.tsx', 'web/src/**/*.test.ts'],
          environment: 'happy-dom',
          setupFiles: ['web/src/test-setup.ts'],
        },
      },
      // Repository checks: the boundary rule between engine, contracts, figure kinds, server and web.
      { test: { name: 'repo', include: ['scripts/**/*.test.ts'], environment: 'node', testTimeout: 120_000 } },
      {
        resolve: { alias },
        test: {
          name: 'browser',
          include: ['e2e/**/*.browser.test.ts'],
          environment: 'node',
          testTimeout: 120_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});

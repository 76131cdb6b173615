import { defineConfig } from 'vitest/config';
import { fileURLToPath } from 'node:url';

const commonSrc = fileURLToPath(new URL('./common/src/index.ts', import.meta.url));
const demoGeneratorSrc = fileURLToPath(new URL('./server/demo-generator/src/index.ts', import.meta.url));
// Tests read @upwell/common and @upwell/demo-generator from their source, so they need no build of either.
const alias = { '@upwell/common': commonSrc, '@upwell/demo-generator': demoGeneratorSrc };

export default defineConfig({
  test: {
    projects: [
      { resolve: { alias }, test: { name: 'common', include: ['common/src/**/*.test.ts'], environment: 'node' } },
      // The same tests under a DOM environment, only for the common/ files the browser runs. Found by following every name
      // web/src imports from @upwell/common to its file (tree-shaken: the analysis run* functions are never called there):
      // the figure presentation, the editor and protocol contracts, and of the engine only series/month.ts (and the
      // MAX_HARMONICS constant of series/climatology-harmonic.ts, which has no test of its own).
      {
        resolve: { alias },
        test: {
          name: 'common-dom',
          include: [
            'common/src/series/month.test.ts',
            'common/src/figures/**/*.test.ts',
            'common/src/figure-kinds/**/*.test.ts',
            'common/src/editor/**/*.test.ts',
            'common/src/collab/**/*.test.ts',
          ],
          environment: 'happy-dom',
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'server',
          include: ['server/src/**/*.spec.ts', 'server/test/**/*.spec.ts', 'server/bench/**/*.spec.ts', 'server/demo-generator/src/**/*.spec.ts'],
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

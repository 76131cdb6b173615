import { afterAll, beforeAll } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './browser';
import { startBuiltServer, type RunningServer } from './server';

/** The built server and a Chromium for one test file, started before and stopped after its tests. */
export interface Harness {
  readonly server: RunningServer;
  readonly browser: Browser;
}

/** Registers the hooks that start the built server and Chromium for this file; read the fields inside tests. */
export function useServerAndBrowser(env: Record<string, string> = {}): Harness {
  let server: RunningServer | undefined;
  let browser: Browser | undefined;
  let close: (() => Promise<void>) | undefined;
  beforeAll(async () => {
    server = await startBuiltServer(env);
    ({ browser, close } = await launchBrowser());
  });
  afterAll(async () => {
    await close?.();
    await server?.stop();
  });
  return {
    get server() {
      if (!server) throw new Error('the server is not started yet');
      return server;
    },
    get browser() {
      if (!browser) throw new Error('the browser is not started yet');
      return browser;
    },
  };
}

import type { BrowserContext } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';
import { launchBrowser } from './browser';
import { startServer, type RunningServer } from './server';

// One built server with its own database and one fresh browser profile per test file.
export function useServerAndBrowser(env: Record<string, string> = {}) {
  const ctx = {} as { server: RunningServer; browser: BrowserContext };
  beforeAll(async () => {
    ctx.server = await startServer(env);
    ctx.browser = await launchBrowser();
  });
  afterAll(async () => {
    await ctx.browser?.close();
    await ctx.server?.stop();
  });
  return ctx;
}

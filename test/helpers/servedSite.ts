/**
 * One static server over a built handbook and one Chromium per test file: started before the
 * file's tests, closed after them. Browser test files call `serveBuiltSite()` at the top level.
 */
import { afterAll, beforeAll } from 'vitest';
import type { Browser } from 'playwright-core';
import { serveStatic, type Served } from '../../src/server/staticServer.ts';
import { launch } from './browser.ts';
import { ROOT_BUILD } from './site.ts';

export interface ServedSite {
  readonly server: Served;
  readonly browser: Browser;
}

export function serveBuiltSite(root = ROOT_BUILD, base = '/'): ServedSite {
  const site = {} as { server: Served; browser: Browser };
  beforeAll(async () => {
    site.server = await serveStatic(root, base);
    site.browser = await launch();
  });
  afterAll(async () => {
    await site.browser?.close();
    await site.server?.close();
  });
  return site;
}

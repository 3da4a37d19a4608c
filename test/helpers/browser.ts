/**
 * Headless Chromium from Debian (/usr/bin/chromium) driven by playwright-core. Never downloads a
 * browser. Collects console errors, page errors and every request that leaves the served origin.
 */
import { chromium, type Browser, type Page } from 'playwright-core';

export const CHROMIUM = process.env.DAMPBOOK_CHROMIUM ?? '/usr/bin/chromium';
export const CHROMIUM_ARGS = ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'];

export function launch(): Promise<Browser> {
  return chromium.launch({ executablePath: CHROMIUM, args: CHROMIUM_ARGS });
}

export interface Watched {
  readonly page: Page;
  readonly consoleErrors: string[];
  readonly pageErrors: string[];
  readonly foreignRequests: string[];
  readonly dialogs: string[];
}

export async function watchedPage(browser: Browser, origin: string, viewport = { width: 1280, height: 900 }): Promise<Watched> {
  const context = await browser.newContext({ viewport });
  const page = await context.newPage();
  const w: Watched = { page, consoleErrors: [], pageErrors: [], foreignRequests: [], dialogs: [] };
  page.on('console', (m) => { if (m.type() === 'error') w.consoleErrors.push(m.text()); });
  page.on('pageerror', (e) => w.pageErrors.push(e.message));
  page.on('request', (r) => { const u = r.url(); if (!u.startsWith(origin) && !u.startsWith('data:') && !u.startsWith('blob:')) w.foreignRequests.push(u); });
  page.on('dialog', (d) => { w.dialogs.push(d.message()); void d.dismiss(); });
  return w;
}

/**
 * Waits until the page is parsed and every calculator on it shows its first result. The parse
 * matters after a click: the next page can be caught half-read (a classic script holds up the
 * parser), with no calculator element yet, and "every calculator ready" is then trivially true.
 */
export async function calculatorsReady(page: Page): Promise<void> {
  await page.waitForFunction(() => document.readyState !== 'loading' && [...document.querySelectorAll('db-calculator')].every((c) => c.hasAttribute('data-ready')));
}

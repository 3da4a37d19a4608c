/**
 * Clean crawl of both test builds (site root and the /handbook/ sub-path) in one Chromium: every
 * built page loads under the site's Content-Security-Policy with zero console errors, page errors,
 * CSP violations, failed requests or requests to another host; every internal link and #anchor
 * resolves; search works and its excerpts hold prose, not TeX; axe-core finds no serious or
 * critical violation on any page of the root build (the sub-path build has the same markup with
 * prefixed URLs, checked by test/site/build.test.ts).
 */
import { existsSync } from 'node:fs';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { serveStatic, type Served } from '../../src/server/staticServer.ts';
import { launch } from '../helpers/browser.ts';
import {
  anchorsOf, builtPages, collectLinks, cspViolationsIn, fileFor, newWatchedContext, openWatched, pool, runAxe, settle,
  type AxeViolation, type Visit,
} from '../helpers/crawl.ts';
import { ROOT_BUILD, SUB_BASE, SUB_BUILD } from '../helpers/site.ts';

let browser: Browser;
beforeAll(async () => { browser = await launch(); });
afterAll(async () => { await browser?.close(); });

/** A TeX control word (\frac, \omega, \mathrm …) or KaTeX class names leaking into search text. */
const TEX = /\\[a-zA-Z]{2,}|katex|\\\(|\$\$/;

describe.each([
  { name: 'site root', root: ROOT_BUILD, base: '/', axe: true },
  { name: `sub-path ${SUB_BASE}`, root: SUB_BUILD, base: SUB_BASE, axe: false },
])('crawl of the $name build', ({ root, base, axe }) => {
  let server: Served;
  const visits: Visit[] = [];
  const axeFindings: { url: string; v: AxeViolation }[] = [];
  const searchExcerpts: string[] = [];
  const pages = builtPages(root, base);

  beforeAll(async () => {
    server = await serveStatic(root, base);
    const ctx = await newWatchedContext(browser);
    await pool(pages, 2, async (path) => {
      const { page, visit } = await openWatched(ctx, server.origin, path);
      await page.goto(`${server.origin}${path}`, { waitUntil: 'load' });
      await settle(page);
      if (path === base) {
        // use search once per build: the engine loads from the site's own folder, under the base
        await page.fill('#finder-q', 'damping ratio');
        await page.waitForSelector('#finder-results li a', { timeout: 20_000 });
        searchExcerpts.push(...await page.locator('#finder-results li p').allTextContents());
      }
      visit.links.push(...await collectLinks(page));
      visit.cspViolations.push(...await cspViolationsIn(page));
      if (axe) for (const v of await runAxe(page)) axeFindings.push({ url: path, v });
      visits.push(visit);
      await page.close();
    });
    await ctx.close();
  }, 600_000);
  afterAll(async () => { await server?.close(); });

  it('finds the built pages (home, about, 404 and at least one calculation page)', () => {
    expect(pages).toContain(base);
    expect(pages).toContain(`${base}about/`);
    expect(pages).toContain(`${base}404.html`);
    expect(pages.length).toBeGreaterThanOrEqual(4);
    expect(visits.map((v) => v.url).sort()).toEqual(pages);
  });

  it('loads every page with no console error, page error, failed request or dialog', () => {
    const bad = visits.flatMap((v) => [...v.consoleErrors, ...v.pageErrors, ...v.failedRequests, ...v.dialogs].map((e) => `${v.url}: ${e}`));
    expect(bad).toEqual([]);
  });

  it('runs the whole site under its Content-Security-Policy with zero violations', () => {
    expect(visits.flatMap((v) => v.cspViolations.map((e) => `${v.url}: ${e}`))).toEqual([]);
  });

  it('requests nothing from any host but the serving origin', () => {
    expect(visits.flatMap((v) => v.foreignRequests.map((e) => `${v.url}: ${e}`))).toEqual([]);
  });

  it('resolves every internal link and #anchor to a built file and an element id', () => {
    const broken: string[] = [];
    const anchors = new Map<string, Set<string>>();
    for (const v of visits) {
      for (const href of v.links) {
        const u = new URL(href);
        if (u.origin !== server.origin) continue; // a reference link an author wrote in prose
        const file = fileFor(root, base, u.pathname);
        if (!file || !existsSync(file)) { broken.push(`${v.url} → ${u.pathname} (no such file)`); continue; }
        if (u.hash.length > 1 && file.endsWith('.html')) {
          if (!anchors.has(file)) anchors.set(file, anchorsOf(file));
          const id = decodeURIComponent(u.hash.slice(1));
          if (!anchors.get(file)!.has(id)) broken.push(`${v.url} → ${u.pathname}${u.hash} (no element with this id)`);
        }
      }
    }
    expect(broken).toEqual([]);
    expect(visits.reduce((n, v) => n + v.links.length, 0)).toBeGreaterThan(pages.length * 3);
  });

  it('finds pages with search, with excerpts of prose and no TeX commands', () => {
    expect(searchExcerpts.length).toBeGreaterThan(0);
    for (const e of searchExcerpts) expect(e).not.toMatch(TEX);
  });

  it.runIf(axe)('passes axe-core on every page with no serious or critical violation', () => {
    const severe = axeFindings.filter((f) => f.v.impact === 'serious' || f.v.impact === 'critical');
    expect(severe.map((f) => `${f.url}: ${f.v.impact} ${f.v.id} (${f.v.help}) at ${f.v.targets.join(' | ')}`)).toEqual([]);
  });
});

/**
 * Crawling the built handbook: every HTML page of a build, visited in one shared Chromium with
 * watchers for console errors, page errors, CSP violations, failed and foreign requests. Pages
 * are found by walking the build folder, so every page another helper adds is covered.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import type { Browser, BrowserContext, Page } from 'playwright-core';

export const AXE_SOURCE_PATH = 'node_modules/axe-core/axe.min.js';

/** Every built HTML page as a URL path under `base` ("/", "/oscillators/sdof/", "/404.html"). */
export function builtPages(root: string, base: string): string[] {
  const out: string[] = [];
  const walk = (dir: string): void => {
    for (const n of readdirSync(dir)) {
      const p = join(dir, n);
      if (statSync(p).isDirectory()) { if (n !== 'pagefind' && n !== '_astro' && n !== '_db') walk(p); continue; }
      if (!n.endsWith('.html')) continue;
      const rel = relative(root, p).split(sep).join('/');
      out.push(base + (rel === 'index.html' ? '' : rel.endsWith('/index.html') ? rel.slice(0, -'index.html'.length) : rel));
    }
  };
  walk(root);
  return out.sort();
}

/** Built file for a URL path (undefined when the path leaves the base). */
export function fileFor(root: string, base: string, path: string): string | undefined {
  if (!path.startsWith(base)) return undefined;
  const rel = decodeURIComponent(path.slice(base.length));
  return join(root, rel === '' || rel.endsWith('/') ? `${rel}index.html` : rel);
}

/** Ids and names an anchor (#frag) may point at, read from a built HTML file. */
export function anchorsOf(file: string): Set<string> {
  const html = readFileSync(file, 'utf8');
  return new Set([...html.matchAll(/\s(?:id|name)="([^"]+)"/g)].map((m) => m[1]!.replace(/&amp;/g, '&').replace(/&quot;/g, '"')));
}

export interface Visit {
  readonly url: string;
  readonly consoleErrors: string[];
  readonly pageErrors: string[];
  readonly foreignRequests: string[];
  readonly failedRequests: string[];
  readonly cspViolations: string[];
  readonly dialogs: string[];
  /** Every URL the page refers to: a[href], link[href], script[src], img[src] (absolute). */
  readonly links: string[];
}

/** Records CSP violations in the page (runs before any page script; not subject to the page's CSP). */
const CSP_WATCH = `window.__cspViolations = [];
document.addEventListener('securitypolicyviolation', (e) => window.__cspViolations.push(e.violatedDirective + ' ' + e.blockedURI));`;

export async function newWatchedContext(browser: Browser, opts: { bypassCSP?: boolean } = {}): Promise<BrowserContext> {
  const ctx = await browser.newContext({ viewport: { width: 1280, height: 900 }, bypassCSP: opts.bypassCSP ?? false });
  await ctx.addInitScript({ content: CSP_WATCH });
  return ctx;
}

/** Opens a page with every watcher attached; `visit.url` is the address asked for. */
export async function openWatched(ctx: BrowserContext, origin: string, url: string): Promise<{ page: Page; visit: Visit }> {
  const page = await ctx.newPage();
  const visit: Visit = { url, consoleErrors: [], pageErrors: [], foreignRequests: [], failedRequests: [], cspViolations: [], dialogs: [], links: [] };
  page.on('console', (m) => {
    if (m.type() === 'error') visit.consoleErrors.push(m.text());
    if (/content security policy/i.test(m.text())) visit.cspViolations.push(m.text());
  });
  page.on('pageerror', (e) => visit.pageErrors.push(e.message));
  page.on('dialog', (d) => { visit.dialogs.push(d.message()); void d.dismiss(); });
  page.on('request', (r) => {
    const u = r.url();
    if (!u.startsWith(`${origin}/`) && !u.startsWith('data:') && !u.startsWith('blob:')) visit.foreignRequests.push(u);
  });
  page.on('response', (r) => {
    // the 404 page itself is served with status 404 on purpose
    if (r.status() >= 400 && !(r.request().isNavigationRequest() && url.endsWith('404.html'))) visit.failedRequests.push(`${r.status()} ${r.url()}`);
  });
  page.on('requestfailed', (r) => visit.failedRequests.push(`failed ${r.url()} ${r.failure()?.errorText ?? ''}`));
  return { page, visit };
}

/** Waits until every calculator is live, has no computation on its way (`data-computing`, a worker's answer) and every chart figure has its live chart. */
export async function settle(page: Page): Promise<void> {
  await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
  await page.waitForFunction(() => {
    const calcs = [...document.querySelectorAll('db-calculator')];
    if (calcs.some((c) => !c.hasAttribute('data-ready') || c.hasAttribute('data-computing'))) return false;
    const figs = [...document.querySelectorAll('db-calculator figure.chart .chart-canvas')];
    return figs.every((f) => f.hasAttribute('data-live') || f.querySelector('svg') === null);
  }, undefined, { timeout: 20_000 });
}

/** Links of a page, resolved against its address. */
export async function collectLinks(page: Page): Promise<string[]> {
  return page.evaluate(() => [
    ...[...document.querySelectorAll('a[href], link[href]')].map((e) => (e as HTMLAnchorElement).href),
    ...[...document.querySelectorAll('script[src], img[src]')].map((e) => (e as HTMLImageElement).src),
  ].filter((u) => u !== ''));
}

export async function cspViolationsIn(page: Page): Promise<string[]> {
  return page.evaluate(() => (window as unknown as { __cspViolations?: string[] }).__cspViolations ?? []);
}

export interface AxeViolation { id: string; impact: string | null; help: string; targets: string[] }

/**
 * Runs axe-core in the page. The script is evaluated through the DevTools protocol, which the
 * page's Content-Security-Policy does not govern, so no CSP bypass is needed.
 */
export async function runAxe(page: Page): Promise<AxeViolation[]> {
  if (!(await page.evaluate(() => 'axe' in window))) await page.evaluate(readFileSync(AXE_SOURCE_PATH, 'utf8'));
  return page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run(ctx: Document, o: object): Promise<{ violations: { id: string; impact: string | null; help: string; nodes: { target: unknown[] }[] }[] }> } }).axe;
    const r = await axe.run(document, { resultTypes: ['violations'] });
    return r.violations.map((v) => ({ id: v.id, impact: v.impact, help: v.help, targets: v.nodes.slice(0, 5).map((n) => String(n.target.join(' '))) }));
  });
}

/** Runs `fn` over `items` with at most `n` at a time. */
export async function pool<T, R>(items: readonly T[], n: number, fn: (t: T) => Promise<R>): Promise<R[]> {
  const out: R[] = new Array(items.length);
  let next = 0;
  await Promise.all(Array.from({ length: Math.min(n, items.length) }, async () => {
    while (next < items.length) { const i = next++; out[i] = await fn(items[i]!); }
  }));
  return out;
}

/**
 * Script files a page loads at once: its <script src> and modulepreload links, plus every module
 * they import statically (followed through the files); dynamic import() chunks load later and are
 * not counted. Paths are URL paths under `base`.
 */
export function loadedScripts(root: string, base: string, pagePath: string): string[] {
  const html = readFileSync(fileFor(root, base, pagePath)!, 'utf8');
  const todo = [...html.matchAll(/<(?:script[^>]*\ssrc|link[^>]*rel="modulepreload"[^>]*\shref)="([^"]+)"/g)].map((m) => m[1]!);
  const seen = new Set<string>();
  while (todo.length) {
    const path = todo.pop()!;
    if (seen.has(path)) continue;
    seen.add(path);
    const code = readFileSync(fileFor(root, base, path)!, 'utf8');
    // static forms only: `import x from "…"`, `import "…"`, `export … from "…"` (not `import(`)
    for (const m of code.matchAll(/(?:^|[;\s}])(?:import|export)\s*(?:[\w$*{},\s]+?\s*from\s*)?["']([^"']+\.m?js)["']/g)) {
      todo.push(new URL(m[1]!, `http://x${path}`).pathname);
    }
  }
  return [...seen];
}

/**
 * Prints a handbook page's calculation sheet to PDF with headless Chromium (playwright-core,
 * Debian's /usr/bin/chromium; never downloads a browser): serves the built site, opens the page
 * with the inputs and sheet details in its address, waits for the calculators, charts and
 * sheet header, and prints with the page's own @page rules (paper size, footer with the build
 * and "page x of y"). Used by `dampbook sheet` and the browser tests.
 */
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import { serveStatic } from '../server/staticServer.ts';
import type { Paper } from './pageCss.ts';

export const SHEET_FIELDS = ['project', 'no', 'calc', 'by', 'checker', 'date'] as const;
export type SheetFields = Partial<Record<(typeof SHEET_FIELDS)[number], string>>;

export interface PrintOptions {
  /** Built site folder (dist/). */
  readonly site: string;
  /** Base path the site was built for ('/' unless DAMPBOOK_BASE was set). */
  readonly base?: string;
  /** Page id ("sdof") or URL path ("oscillators/sdof"). */
  readonly page: string;
  readonly inputs?: readonly (readonly [string, string])[];
  readonly sheet?: SheetFields;
  readonly paper?: Paper;
  readonly pdf: string;
  readonly chromium?: string;
}

export class SheetError extends Error {
  override name = 'SheetError';
}

function htmlFiles(dir: string, out: string[] = []): string[] {
  for (const n of readdirSync(dir)) {
    const p = join(dir, n);
    if (statSync(p).isDirectory()) { if (n !== 'pagefind' && n !== '_astro' && n !== '_db') htmlFiles(p, out); } else if (n === 'index.html') out.push(p);
  }
  return out;
}

/** The page's URL path inside the built site, from its id or path. */
export function findPagePath(site: string, page: string): string {
  const want = page.replace(/^\/+|\/+$/g, '');
  for (const f of htmlFiles(site)) {
    const path = relative(site, f).split(sep).slice(0, -1).join('/');
    if (path === want) return path;
    const m = /data-page-id="([^"]+)"/.exec(readFileSync(f, 'utf8'));
    if (m && m[1] === want) return path;
  }
  throw new SheetError(`no page '${page}' in the built site ${site} (give a page id such as sdof, or a path such as oscillators/sdof)`);
}

export async function printSheet(o: PrintOptions): Promise<{ url: string }> {
  const chromiumPath = o.chromium ?? process.env.DAMPBOOK_CHROMIUM ?? '/usr/bin/chromium';
  if (!existsSync(join(o.site, 'index.html'))) throw new SheetError(`no built handbook in ${o.site}: run npm run build first, or give --site <folder>`);
  if (!existsSync(chromiumPath)) throw new SheetError(`Chromium not found at ${chromiumPath} (install Debian's chromium or set DAMPBOOK_CHROMIUM)`);
  const path = findPagePath(o.site, o.page);
  const params = new URLSearchParams();
  for (const [k, v] of o.inputs ?? []) params.set(k, v);
  for (const k of SHEET_FIELDS) if (o.sheet?.[k]) params.set(`sheet-${k}`, o.sheet[k]!);
  if (o.paper === 'letter') params.set('paper', 'letter');
  const { chromium } = await import('playwright-core');
  const served = await serveStatic(o.site, o.base ?? '/');
  const browser = await chromium.launch({ executablePath: chromiumPath, args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--no-first-run'] });
  try {
    const page = await (await browser.newContext({ viewport: { width: 1100, height: 1400 } })).newPage();
    const url = `${served.url}${path}/?${params.toString()}`;
    const res = await page.goto(url);
    if (!res || !res.ok()) throw new SheetError(`could not open ${url}: HTTP ${res?.status() ?? 'no response'}`);
    const calcs = page.locator('db-calculator');
    const n = await calcs.count();
    for (let i = 0; i < n; i++) await calcs.nth(i).and(page.locator('[data-ready]')).waitFor({ timeout: 20_000 });
    const known = await page.locator('db-calculator [name]').evaluateAll((els) => els.map((e) => (e as HTMLInputElement).name));
    const unknown = (o.inputs ?? []).map(([k]) => k).filter((k) => !known.includes(k));
    if (unknown.length) throw new SheetError(`the page has no input ${unknown.map((k) => `'${k}'`).join(', ')}; inputs: ${[...new Set(known.filter((k) => !k.includes('.') && k !== 'units'))].join(', ')}`);
    const bad = await page.locator('.field[data-invalid]').evaluateAll((els) => els.map((e) => `${(e as HTMLElement).dataset.key}: ${e.querySelector('.msg')?.textContent ?? ''}`));
    if (bad.length) throw new SheetError(`invalid input ${bad.join('; ')}`);
    const stale = await page.locator('db-calculator[data-stale] .calc-state').allTextContents();
    if (stale.length) throw new SheetError(`the calculator could not compute: ${stale.join('; ')}`);
    if (await page.locator('[data-sheet-panel]').count()) await page.locator('[data-sheet-panel][data-ready]').waitFor({ timeout: 10_000 });
    // live charts are drawn after the first result: wait until every figure has its canvas
    await page.waitForFunction(() => [...document.querySelectorAll('db-calculator .chart-canvas')].every((c) => c.hasAttribute('data-live')), undefined, { timeout: 20_000 });
    await page.emulateMedia({ media: 'print' });
    await page.pdf({ path: o.pdf, preferCSSPageSize: true, printBackground: true });
    return { url };
  } finally {
    await browser.close();
    await served.close();
  }
}

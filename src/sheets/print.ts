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
export type SheetFields = Partial<Record<(typeof SHEET_FIELDS)[number], string | undefined>>;

export interface PrintOptions {
  /** Built site folder (dist/). */
  readonly site: string;
  /** Base path the site was built for ('/' unless DAMPBOOK_BASE was set). */
  readonly base?: string;
  /** Page id ("sdof") or URL path ("oscillators/sdof"). */
  readonly page: string;
  /** Values for the page address (number and choice inputs), as `?key=value`. */
  readonly inputs?: readonly (readonly [string, string])[];
  /**
   * Text inputs put into the page before printing (too long for an address): the text, and the
   * line printed under the field to identify it (e.g. file name, rows, checksum).
   */
  readonly texts?: readonly SheetText[];
  /**
   * Per calculator id, the SI values the page must compute with (the CLI's own evaluation):
   * the sheet is refused unless the page's calculator holds exactly these (numbers within
   * 1e-9 relative: the address carries 10 significant digits).
   */
  readonly expect?: Readonly<Record<string, Readonly<Record<string, number | string>>>>;
  readonly sheet?: SheetFields;
  /** localStorage entries set before the page loads (e.g. the study to print on /studies/open/). */
  readonly storage?: Readonly<Record<string, string>>;
  /** A selector the page shows once it is ready to print; `[role=alert]` text instead refuses the sheet. */
  readonly ready?: string;
  readonly paper?: Paper;
  readonly pdf: string;
  readonly chromium?: string;
}

export interface SheetText { readonly key: string; readonly text: string; readonly label: string }

export class SheetError extends Error {
  override name = 'SheetError';
}

/** A base path as the site is built for: "/" or "/segment/…/" of plain URL characters. */
export function checkBase(base: string): string {
  const b = base.endsWith('/') ? base : `${base}/`;
  if (!/^\/([A-Za-z0-9._~-]+\/)*$/.test(b) || b.split('/').some((seg) => seg === '.' || seg === '..')) {
    throw new SheetError(`--base ${JSON.stringify(base)}: give the path the site was built for, such as / or /handbook/`);
  }
  return b;
}

function htmlFiles(dir: string, out: string[] = []): string[] {
  for (const n of readdirSync(dir)) {
    const p = join(dir, n);
    let st;
    try { st = statSync(p); } catch { continue; } // a dangling link in the built site is not a page
    // only regular files are read (a FIFO or device named index.html would block or never end)
    if (st.isDirectory()) { if (n !== 'pagefind' && n !== '_astro' && n !== '_db') htmlFiles(p, out); } else if (n === 'index.html' && st.isFile()) out.push(p);
  }
  return out;
}

export interface BuiltPage {
  /** URL path inside the site ("oscillators/sdof"). */
  readonly path: string;
  /** Ids of the calculators on the page, in page order. */
  readonly calculators: readonly string[];
  /** The base the page was built for, read from its own script addresses (undefined: no scripts). */
  readonly base?: string;
}

function builtPage(path: string, html: string): BuiltPage {
  const calculators = [...html.matchAll(/<db-calculator\b[^>]*\bdata-calc="([^"]+)"/g)].map((m) => m[1]!);
  const base = /\ssrc="([^"]*\/)_db\//.exec(html)?.[1];
  return { path, calculators, ...(base !== undefined ? { base } : {}) };
}

/** The page's URL path inside the built site, from its id or path. */
export function findPagePath(site: string, page: string): string {
  return findPage(site, page).path;
}

/** The page in the built site, from its id or path: its URL path, calculators and built base. */
export function findPage(site: string, page: string): BuiltPage {
  const want = page.replace(/^\/+|\/+$/g, '');
  for (const f of htmlFiles(site)) {
    const path = relative(site, f).split(sep).slice(0, -1).join('/');
    const html = readFileSync(f, 'utf8');
    if (path === want) return builtPage(path, html);
    const m = /data-page-id="([^"]+)"/.exec(html);
    if (m && m[1] === want) return builtPage(path, html);
  }
  throw new SheetError(`no page '${page}' in the built site ${site} (give a page id such as sdof, or a path such as oscillators/sdof)`);
}

export async function printSheet(o: PrintOptions): Promise<{ url: string }> {
  const chromiumPath = o.chromium ?? process.env.DAMPBOOK_CHROMIUM ?? '/usr/bin/chromium';
  const base = checkBase(o.base ?? '/');
  if (!existsSync(join(o.site, 'index.html'))) throw new SheetError(`no built handbook in ${o.site}: run npm run build first, or give --site <folder>`);
  if (!existsSync(chromiumPath)) throw new SheetError(`Chromium not found at ${chromiumPath} (install Debian's chromium or set DAMPBOOK_CHROMIUM)`);
  const found = findPage(o.site, o.page);
  if (found.base !== undefined && found.base !== base) throw new SheetError(`the site in ${o.site} was built for the base ${found.base}, not ${base}: give --base ${found.base}`);
  const path = found.path;
  const params = new URLSearchParams();
  for (const [k, v] of o.inputs ?? []) params.set(k, v);
  for (const k of SHEET_FIELDS) if (o.sheet?.[k]) params.set(`sheet-${k}`, o.sheet[k]!);
  if (o.paper === 'letter') params.set('paper', 'letter');
  const { chromium } = await import('playwright-core');
  let served: Awaited<ReturnType<typeof serveStatic>> | undefined;
  let browser: Awaited<ReturnType<typeof chromium.launch>> | undefined;
  try {
    served = await serveStatic(o.site, base);
    try {
      browser = await chromium.launch({ executablePath: chromiumPath, timeout: 30_000, args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--no-first-run'] });
    } catch (e) {
      throw new SheetError(`Chromium at ${chromiumPath} could not start: ${firstLine(e)}`);
    }
    const context = await browser.newContext({ viewport: { width: 1100, height: 1400 } });
    if (o.storage) await context.addInitScript((entries) => { for (const [k, v] of Object.entries(entries)) localStorage.setItem(k, v); }, o.storage);
    const page = await context.newPage();
    const url = `${served.url}${path}/?${params.toString()}`;
    const res = await page.goto(url);
    if (!res || !res.ok()) throw new SheetError(`could not open ${url}: HTTP ${res?.status() ?? 'no response'}`);
    if (o.ready) {
      await page.locator(`${o.ready}, [role="alert"]`).first().waitFor({ timeout: 20_000 });
      const alert = await page.locator('[role="alert"]').allTextContents();
      if (alert.length) throw new SheetError(alert.join('; ').trim());
    }
    const calcs = page.locator('db-calculator');
    const n = await calcs.count();
    for (let i = 0; i < n; i++) await calcs.nth(i).and(page.locator('[data-ready]')).waitFor({ timeout: 20_000 });
    const known = await page.locator('db-calculator [name]').evaluateAll((els) => els.map((e) => (e as HTMLInputElement).name));
    const unknown = [...(o.inputs ?? []).map(([k]) => k), ...(o.texts ?? []).map((t) => t.key)].filter((k) => !known.includes(k));
    if (unknown.length) throw new SheetError(`the page has no input ${unknown.map((k) => `'${k}'`).join(', ')}; inputs: ${[...new Set(known.filter((k) => !k.includes('.') && k !== 'units'))].join(', ')}`);
    // text inputs go into their fields as if pasted (the same path as typing), then recompute
    if (o.texts?.length) {
      await page.evaluate((texts) => {
        for (const t of texts) {
          for (const el of document.querySelectorAll(`db-calculator [name="${CSS.escape(t.key)}"]`)) {
            (el as HTMLTextAreaElement).value = t.text;
            el.dispatchEvent(new Event('input', { bubbles: true }));
          }
        }
      }, o.texts.map((t) => ({ key: t.key, text: t.text })));
    }
    // a recompute may still be on its way: the next frame's, or a worker's answer (offMainThread)
    await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
    await page.waitForFunction(() => !document.querySelector('db-calculator[data-computing]'), undefined, { timeout: 20_000 });
    if (o.expect) await expectValues(page, o.expect);
    const bad = await page.locator('.field[data-invalid]').evaluateAll((els) => els.map((e) => `${(e as HTMLElement).dataset.key}: ${e.querySelector('.msg')?.textContent ?? ''}`));
    if (bad.length) throw new SheetError(`invalid input ${bad.join('; ')}`);
    const stale = await page.locator('db-calculator[data-stale] .calc-state').allTextContents();
    if (stale.length) throw new SheetError(`the calculator could not compute: ${stale.join('; ')}`);
    // the printed sheet names the data behind each text input (file, rows, checksum)
    if (o.texts?.length) {
      await page.evaluate((texts) => {
        for (const t of texts) {
          for (const el of document.querySelectorAll(`db-calculator [name="${CSS.escape(t.key)}"]`)) {
            const p = document.createElement('p');
            p.className = 'sheet-text-source';
            p.dataset.sheetText = t.key;
            p.textContent = t.label;
            (el.closest('.field') ?? el).insertAdjacentElement('afterend', p);
          }
        }
      }, o.texts.map((t) => ({ key: t.key, label: t.label })));
    }
    if (await page.locator('[data-sheet-panel]').count()) await page.locator('[data-sheet-panel][data-ready]').waitFor({ timeout: 10_000 });
    // live charts are drawn after the first result: wait until every figure has its canvas
    await page.waitForFunction(() => [...document.querySelectorAll('db-calculator .chart-canvas')].every((c) => c.hasAttribute('data-live')), undefined, { timeout: 20_000 });
    await page.emulateMedia({ media: 'print' });
    await page.pdf({ path: o.pdf, preferCSSPageSize: true, printBackground: true });
    return { url };
  } finally {
    await browser?.close().catch(() => undefined);
    await served?.close();
  }
}

function firstLine(e: unknown): string {
  return (e instanceof Error ? e.message : String(e)).split('\n').map((l) => l.trim()).find((l) => l !== '') ?? 'unknown error';
}

type PageValues = Readonly<Record<string, Readonly<Record<string, number | string>>>>;

/**
 * Waits until every calculator on the page holds the expected values (its `values`, set after a
 * valid computation); refuses the sheet naming each input that differs.
 */
async function expectValues(page: import('playwright-core').Page, want: PageValues): Promise<void> {
  // one self-contained function (it runs in the page): `wait` → true once equal, else the differences
  const compare = ({ w, wait }: { w: PageValues; wait: boolean }): boolean | string[] => {
    const out: string[] = [];
    for (const el of document.querySelectorAll('db-calculator')) {
      const id = (el as HTMLElement).dataset.calc ?? '';
      const exp = w[id];
      if (!exp) continue;
      const got = (el as unknown as { values?: Record<string, number | string> }).values;
      if (!got) { out.push(`${id}: no result`); continue; }
      for (const [k, v] of Object.entries(exp)) {
        const g = got[k];
        const same = typeof v === 'number' && typeof g === 'number' ? Math.abs(g - v) <= 1e-9 * Math.max(Math.abs(v), 1e-300) : g === v;
        if (!same) out.push(`${k} (page ${typeof g === 'string' ? `${g.length} characters` : String(g)}, given ${typeof v === 'string' ? `${v.length} characters` : String(v)})`);
      }
    }
    return wait ? out.length === 0 : out;
  };
  try {
    await page.waitForFunction(compare, { w: want, wait: true }, { timeout: 20_000, polling: 100 });
  } catch {
    const diffs = (await page.evaluate(compare, { w: want, wait: false })) as string[];
    if (diffs.length) throw new SheetError(`the page computed with other inputs than given: ${diffs.join('; ')}`);
  }
}

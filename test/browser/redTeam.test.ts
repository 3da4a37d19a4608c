/**
 * Red-team findings that live in the page, each reproduced in real Chromium (each failed before its
 * fix): a value the page does not take from its address is named at its field (a 100 kB or 1 MB
 * number, an over-long power profile); a long record stays out of the live textarea (name, rows,
 * checksum shown instead) and is read as loaded; an imported record — with or without a UTF-8
 * byte-order mark — keeps the inputs that were hidden when it was made. Behaviour, no reference
 * values (the record's outputs are the page's own).
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/calculators/evaluate.ts';
import { getCalculator } from '../../src/calculators/registry.ts';
import { makeRecord } from '../../src/records/replay.ts';
import { watchedPage, type Watched } from '../helpers/browser.ts';
import { fileFor } from '../helpers/crawl.ts';
import { serveBuiltSite } from '../helpers/servedSite.ts';
import { ROOT_BUILD } from '../helpers/site.ts';

const site = serveBuiltSite();
const tmp = mkdtempSync(join(tmpdir(), 'dampbook-redteam-'));

async function open(path: string, query = ''): Promise<Watched> {
  const w = await watchedPage(site.browser, site.server.origin);
  // Node's HTTP server refuses request lines over 16 KB: a long address is answered from disk
  await w.page.route((u) => u.search.length > 10_000, (route) => route.fulfill({ path: fileFor(ROOT_BUILD, '/', path)!, contentType: 'text/html' }));
  await w.page.goto(`${site.server.origin}${path}${query}`);
  await w.page.waitForSelector('db-calculator[data-ready]');
  return w;
}
const settle = (page: Page) => page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(() => r(null)))));

describe('finding 1: address values the page does not take are named at their field', () => {
  it.each([100_000, 1_000_000])('a %i-character number is not silently replaced by the default', async (n) => {
    const w = await open('/oscillators/sdof/', `?m=${'9'.repeat(n)}`);
    const note = w.page.locator('.field[data-key="m"] .addr-note');
    expect(await note.textContent()).toMatch(/too long/);
    expect(w.pageErrors).toEqual([]);
    await w.page.context().close();
  });

  it('a power profile over its 6000 characters is named at the profile field', async () => {
    const long = `0, 100\n${'# padding\n'.repeat(700)}600`;
    expect(long.length).toBeGreaterThan(6000);
    const w = await open('/thermal/warm-up/', `?power=profile&profile=${encodeURIComponent(long)}`);
    expect(await w.page.locator('.field[data-key="profile"] .addr-note').textContent()).toMatch(/too long \(\d+ characters, at most 6000\)/);
    await w.page.context().close();
  });
});

describe('finding 7: a long record stays out of the live textarea', () => {
  // invented record, 150 000 rows (≈ 3.3 MB): stroke and force of a 2 Hz sine (common practice, no source)
  const rows = ['time [s],stroke [mm],force [N]'];
  for (let i = 0; i < 150_000; i++) { const t = i / 1000; rows.push(`${t.toFixed(3)},${(20 * Math.sin(4 * Math.PI * t)).toFixed(3)},${(300 * Math.cos(4 * Math.PI * t)).toFixed(1)}`); }
  const csv = `${rows.join('\n')}\n`;

  it('an uploaded 3 MB record is summarised (name, rows, checksum), computed, and can be cleared for another', async () => {
    const w = await open('/duty/recorded-motion/');
    const { page } = w;
    const field = page.locator('.field[data-key="csv"]');
    await field.locator('input[type="file"]').setInputFiles({ name: 'bay-run-7.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    const summary = field.locator('.text-summary');
    await expect.poll(() => summary.textContent(), { timeout: 20_000 }).toMatch(/^bay-run-7\.csv: 150 001 rows, [\d ]+ characters, checksum [0-9a-f]{8}\./);
    expect(await field.locator('textarea').isHidden()).toBe(true);
    expect(await field.locator('textarea').inputValue()).toBe('');
    await expect.poll(() => page.locator('tr[data-out="rowsUsed"] .value').first().textContent(), { timeout: 20_000 }).toBe('150000');
    // the link carries the checksum the summary shows
    const sum = /checksum ([0-9a-f]{8})/.exec((await summary.textContent())!)![1];
    await expect.poll(() => new URL(page.url()).searchParams.get('csv.sha')).toBe(sum);
    // another field recomputes with the held record
    await page.fill('input[name="gapFactor"]', '6');
    await settle(page);
    expect(await page.locator('db-calculator').getAttribute('data-stale')).toBe(null);
    expect(await page.locator('tr[data-out="rowsUsed"] .value').first().textContent()).toBe('150000');
    // cleared on request: an empty, visible textarea takes the next record (and says it needs one)
    await summary.locator('button').click();
    expect(await field.locator('textarea').isHidden()).toBe(false);
    expect(await field.locator('textarea').inputValue()).toBe('');
    expect(await field.locator('.text-summary').count()).toBe(0);
    await expect.poll(() => field.locator('.msg').textContent()).not.toBe('');
    expect(w.pageErrors).toEqual([]);
    await page.context().close();
  }, 90_000);

  it('a long paste is held too, and a short one stays in the textarea', async () => {
    const w = await open('/duty/recorded-motion/');
    const field = w.page.locator('.field[data-key="csv"]');
    const part = `${rows.slice(0, 20_000).join('\n')}\n`;
    await field.locator('textarea').evaluate((el, text) => { (el as HTMLTextAreaElement).value = text; el.dispatchEvent(new Event('input', { bubbles: true })); }, part);
    await expect.poll(() => field.locator('.text-summary').textContent()).toMatch(/^pasted text: 20 000 rows/);
    expect(await field.locator('textarea').isHidden()).toBe(true);
    // a short text loaded after it replaces the held one and is shown for editing
    await field.locator('input[type="file"]').setInputFiles({ name: 'short.csv', mimeType: 'text/csv', buffer: Buffer.from(`${rows.slice(0, 50).join('\n')}\n`) });
    await expect.poll(() => field.locator('textarea').inputValue()).toMatch(/^time \[s\]/);
    expect(await field.locator('.text-summary').count()).toBe(0);
    expect(await field.locator('textarea').isHidden()).toBe(false);
    await w.page.context().close();
  }, 60_000);
});

describe('finding 10 and 11: an imported record keeps the inputs hidden when it was made; a BOM is read as the CLI reads it', () => {
  it.each([['plain', ''], ['with a byte-order mark', '\uFEFF']])('energy-per-cycle record (%s): linear law imported, then Coulomb chosen, Ff keeps its value', async (_label, bom) => {
    const epc = getCalculator('energy-per-cycle')!;
    const r = evaluate(epc, { law: 'linear', c: 1500 });
    const rec = makeRecord(epc, r.values, r.outputs, {}, { page: { id: 'energy-per-cycle', revision: 'A' }, coreVersion: '0.0.1' }, new Date('2026-12-02T10:00:00Z'));
    expect(rec.inputs.Ff).toBeUndefined(); // hidden under the linear law: the record has no value for it
    const file = join(tmp, `epc${bom ? '-bom' : ''}.json`);
    writeFileSync(file, `${bom}${JSON.stringify(rec)}`);
    const w = await open('/damper-laws/energy-per-cycle/');
    const { page } = w;
    await page.locator('.calc-records summary').click();
    await page.waitForSelector('.calc-records[data-ready]');
    await page.setInputFiles('.rec-file', file);
    await expect.poll(() => page.locator('.rec-msg').textContent()).toMatch(/Record imported: (\d+) of \1 recorded outputs reproduced/);
    await page.selectOption('select[name="law"]', 'coulomb');
    await settle(page);
    expect(await page.locator('.field[data-key="Ff"] .msg').textContent()).toBe('');
    expect(await page.inputValue('input[name="Ff"]')).not.toBe('');
    expect(await page.locator('db-calculator').getAttribute('data-stale')).toBe(null);
    await page.context().close();
  });
});

/**
 * Garbage in any field of every calculator on every built page: a message appears at that field,
 * no NaN or Infinity is displayed, the calculator marks its results stale, other calculators on
 * the page keep their results, and putting the value back restores the results exactly.
 */
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { serveStatic, type Served } from '../../src/server/staticServer.ts';
import { launch, watchedPage, calculatorsReady } from '../helpers/browser.ts';
import { calculatorPages } from '../helpers/calcPages.ts';
import { ROOT_BUILD } from '../helpers/site.ts';

let server: Served;
let browser: Browser;
beforeAll(async () => { server = await serveStatic(ROOT_BUILD, '/'); browser = await launch(); });
afterAll(async () => { await browser?.close(); await server?.close(); });

/** Typed garbage for a number field, and for a text (CSV) field. */
const NUMBER_GARBAGE = ['12..5x', '-1e999', 'NaN', '<b>3</b>', '9'.repeat(400)];
const TEXT_GARBAGE = 'time,value\n<img src=x onerror=alert(1)>,oops\n1,NaN\n;;;\n';

async function outputs(page: Page, calcId: string): Promise<string> {
  return page.locator(`db-calculator[data-calc="${calcId}"] .out-table`).innerText();
}

const pages = calculatorPages(ROOT_BUILD, '/');

describe('garbage in any calculator field', () => {
  it('finds calculator pages to test', () => { expect(pages.length).toBeGreaterThan(0); });

  for (const { path, calcs } of pages) {
    it(`shows a message at the field and keeps the rest working on ${path}`, async () => {
      const w = await watchedPage(browser, server.origin);
      const { page } = w;
      await page.goto(`${server.origin}${path}`);
      await calculatorsReady(page);
      const before = new Map<string, string>();
      for (const id of calcs) before.set(id, await outputs(page, id));
      for (const id of new Set(calcs)) {
        const host = page.locator(`db-calculator[data-calc="${id}"]`).first();
        const keys = await host.locator('.field:not([hidden])').evaluateAll((fs) => fs.map((f) => (f as HTMLElement).dataset.key!));
        for (const key of keys) {
          const field = host.locator(`.field[data-key="${key}"]`);
          const ctl = field.locator('input[type="text"], textarea').first();
          if ((await ctl.count()) === 0) continue; // a choice: no free text can be typed
          const isText = (await ctl.evaluate((e) => e.tagName)) === 'TEXTAREA';
          const original = await ctl.inputValue();
          for (const junk of isText ? [TEXT_GARBAGE] : NUMBER_GARBAGE) {
            await ctl.fill(junk);
            await expect.poll(() => field.locator('.msg').textContent(), { message: `${id}.${key} = ${junk.slice(0, 20)}` }).not.toBe('');
            expect(await field.getAttribute('data-invalid'), `${id}.${key}`).toBe('');
            expect(await host.getAttribute('data-stale'), `${id}.${key} results marked stale`).toBe('');
            expect(await host.locator('.calc-results').innerText()).not.toMatch(/NaN|Infinity|undefined/);
            // other calculators on the page are untouched
            for (const other of calcs.filter((c) => c !== id)) expect(await outputs(page, other)).toBe(before.get(other));
          }
          await ctl.fill(original);
          await expect.poll(() => field.locator('.msg').textContent(), { message: `${id}.${key} restored` }).toBe('');
          // poll the stale mark: the old outputs stayed on screen (marked stale), so they equal
          // `before` at once, while an off-thread calculator may still be computing the restored value
          await expect.poll(() => host.getAttribute('data-stale'), { message: `${id}.${key} fresh again` }).toBeNull();
          await expect.poll(() => outputs(page, id)).toBe(before.get(id));
        }
      }
      expect(w.pageErrors).toEqual([]);
      expect(w.consoleErrors).toEqual([]);
      expect(w.dialogs).toEqual([]);
    });
  }
});

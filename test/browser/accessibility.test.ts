/**
 * Accessibility of every calculator on every built page (axe-core runs in crawl.test.ts): each
 * control has a label, each number field announces its unit, each chart has a text alternative,
 * and the calculator works from the keyboard alone (Tab to a field, type, the result changes).
 */
import type { Browser, Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { serveStatic, type Served } from '../../src/server/staticServer.ts';
import { launch, watchedPage, calculatorsReady } from '../helpers/browser.ts';
import { calculatorPages } from '../helpers/calcPages.ts';
import { ROOT_BUILD } from '../helpers/site.ts';

let server: Served;
let browser: Browser;
beforeAll(async () => { server = await serveStatic(ROOT_BUILD, '/'); browser = await launch(); });
afterAll(async () => { await browser?.close(); await server?.close(); });

const pages = calculatorPages(ROOT_BUILD, '/');

async function open(path: string): Promise<Page> {
  const w = await watchedPage(browser, server.origin);
  await w.page.goto(`${server.origin}${path}`);
  await calculatorsReady(w.page);
  return w.page;
}

/** Presses Tab until a number field of `host` has focus (at most `max` presses); returns its key. */
async function tabToNumberField(page: Page, host: Locator, skip: Set<string>, max = 60): Promise<string | undefined> {
  for (let i = 0; i < max; i++) {
    await page.keyboard.press('Tab');
    const key = await host.evaluate((h, skipped) => {
      const a = document.activeElement;
      if (!(a instanceof HTMLInputElement) || a.type !== 'text' || !h.contains(a)) return undefined;
      const k = a.closest<HTMLElement>('.field')?.dataset.key;
      return k && !skipped.includes(k) ? k : undefined;
    }, [...skip]);
    if (key) return key;
  }
  return undefined;
}

describe('calculator accessibility', () => {
  it('finds calculator pages to test', () => { expect(pages.length).toBeGreaterThan(0); });

  for (const { path } of pages) {
    it(`labels every control and names every number field's unit on ${path}`, async () => {
      const page = await open(path);
      const problems = await page.evaluate(() => {
        const out: string[] = [];
        for (const ctl of document.querySelectorAll<HTMLInputElement | HTMLSelectElement | HTMLTextAreaElement>('db-calculator input, db-calculator select, db-calculator textarea')) {
          if (ctl.hidden || ctl.closest('[hidden]')) continue;
          const name = ctl.getAttribute('aria-label') ?? [...(ctl.labels ?? [])].map((l) => l.textContent ?? '').join(' ').trim();
          if (!name) out.push(`${ctl.name}: no label`);
        }
        for (const field of document.querySelectorAll<HTMLElement>('db-calculator .field')) {
          const input = field.querySelector<HTMLInputElement>('input[type="text"]');
          if (!input || field.hidden) continue;
          const label = input.labels?.[0]?.textContent ?? '';
          const sel = field.querySelector<HTMLSelectElement>('select[name$=".unit"]:not([hidden])');
          const fixed = field.querySelector('.unit-fixed')?.textContent ?? '';
          const unit = sel ? sel.selectedOptions[0]?.textContent ?? '' : fixed;
          if (unit && unit !== '—' && !label.includes(`(${unit})`)) out.push(`${field.dataset.key}: label "${label}" does not state its unit ${unit}`);
        }
        return out;
      });
      expect(problems).toEqual([]);
      await page.context().close();
    });

    it(`gives every chart a text alternative on ${path}`, async () => {
      const page = await open(path);
      await page.waitForFunction(() => [...document.querySelectorAll('db-calculator figure.chart .chart-canvas')].every((c) => c.hasAttribute('data-live')), undefined, { timeout: 20_000 });
      const figs = await page.evaluate(() => [...document.querySelectorAll('figure.chart')].map((f) => ({
        id: (f as HTMLElement).dataset.chart,
        caption: f.querySelector('figcaption')?.textContent?.trim() ?? '',
        summary: f.querySelector('.chart-summary')?.textContent?.trim() ?? '',
        canvas: f.querySelector('canvas') ? `${f.querySelector('canvas')!.getAttribute('role')}|${f.querySelector('canvas')!.getAttribute('aria-label') ?? ''}` : 'none',
        svgHidden: f.querySelector('svg')?.getAttribute('aria-hidden') ?? 'true',
      })));
      for (const f of figs) {
        expect(f.caption, f.id).not.toBe('');
        expect(f.summary.length, `${f.id} summary`).toBeGreaterThan(20);
        expect(f.summary, f.id).not.toMatch(/NaN|undefined/);
        if (f.canvas !== 'none') expect(f.canvas, f.id).toMatch(/^img\|.{20,}/);
        expect(f.svgHidden, f.id).toBe('true');
      }
      await page.context().close();
    });

    it(`works by keyboard alone on ${path}: Tab to a field, type, the result changes`, async () => {
      const page = await open(path);
      const hosts = page.locator('db-calculator');
      for (let i = 0; i < await hosts.count(); i++) {
        const host = hosts.nth(i);
        const id = await host.getAttribute('data-calc');
        // start from the element just before the calculator's first control
        await host.locator('input[name="units"]').first().focus();
        const before = await host.locator('.out-table').innerText();
        let changed = false;
        const tried = new Set<string>();
        for (let attempt = 0; attempt < 6 && !changed; attempt++) {
          const key = await tabToNumberField(page, host, tried);
          if (!key) break;
          tried.add(key);
          const orig = await page.evaluate(() => (document.activeElement as HTMLInputElement).value);
          const current = Number(orig);
          for (const next of [current === 0 ? 1 : current * 1.5, current === 0 ? 0.5 : current * 0.75]) {
            await page.keyboard.press('ControlOrMeta+a');
            await page.keyboard.type(String(Number(next.toPrecision(6))));
            const ok = await expect.poll(() => host.locator('.out-table').innerText(), { timeout: 3000 }).not.toBe(before).then(() => true, () => false);
            if (ok && !(await host.getAttribute('data-stale'))) { changed = true; break; }
          }
          if (!changed) { await page.keyboard.press('ControlOrMeta+a'); await page.keyboard.type(orig); }
          await host.locator('input[name="units"]').first().focus();
        }
        if (!changed) {
          // a record-driven calculator may have no number field that moves its results: choose
          // another option of a choice (a select) by keyboard instead
          await host.locator('input[name="units"]').first().focus();
          for (let i = 0; i < 60 && !changed; i++) {
            await page.keyboard.press('Tab');
            const onChoice = await host.evaluate((h) => {
              const a = document.activeElement;
              return a instanceof HTMLSelectElement && h.contains(a) && !a.name.endsWith('.unit');
            });
            if (!onChoice) continue;
            await page.keyboard.press('ArrowDown');
            changed = await expect.poll(() => host.locator('.out-table').innerText(), { timeout: 3000 }).not.toBe(before).then(() => true, () => false);
          }
        }
        expect(changed, `${id}: typing into a field or choosing an option reached by Tab changed no result`).toBe(true);
      }
      await page.context().close();
    });
  }
});

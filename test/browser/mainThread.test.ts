/**
 * Typing never blocks the page: on every page of a calculator marked `offMainThread`, typing into
 * its number fields in the heavy cases measured before the worker existed (road-power with a
 * power-law damper on a w = 2.5 road, damper-simulation with friction over 60 s, warm-up with the
 * body model; common practice, no source: 50 ms is the long-task threshold of the Long Tasks API,
 * W3C Long Tasks API Level 1 §3) gives no main-thread task longer than 50 ms, measured with a
 * PerformanceObserver in real Chromium. The "Computing…" state and superseded answers are checked
 * on the slowest of them.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { calculators } from '../../src/calculators/registry.ts';
import { watchedPage, type Watched } from '../helpers/browser.ts';
import { calculatorPages } from '../helpers/calcPages.ts';
import { serveBuiltSite } from '../helpers/servedSite.ts';
import { ROOT_BUILD } from '../helpers/site.ts';

const site = serveBuiltSite();
const LONG_TASK_MS = 50;

function clean(w: Watched): void {
  expect(w.pageErrors).toEqual([]);
  expect(w.consoleErrors).toEqual([]);
  expect(w.foreignRequests).toEqual([]);
}

/** The heavy cases, by address (the page reads its inputs from the query string). */
const HEAVY: Record<string, string> = {
  'road-power': 'law=power&w=2.5',
  'damper-simulation': 'law=coulomb&duration=60',
  'warm-up': 'loss=body',
  'harmonic-duty': '',
  'damping-fade': '',
};

const marked = calculators.filter((c) => c.offMainThread).map((c) => c.id);
const pages = calculatorPages(ROOT_BUILD, '/').flatMap((p) => p.calcs.filter((id) => marked.includes(id)).map((id) => ({ path: p.path, id })));

async function settled(page: Page, id: string): Promise<void> {
  await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
  await page.waitForFunction((calc) => {
    const el = document.querySelector(`db-calculator[data-calc="${calc}"]`);
    return el !== null && !el.hasAttribute('data-computing');
  }, id, { timeout: 30_000 });
}

describe('typing into heavy calculators', () => {
  it('covers every calculator marked offMainThread on a built page', () => {
    expect(new Set(pages.map((p) => p.id))).toEqual(new Set(marked));
    for (const id of marked) expect(HEAVY, `a heavy case for ${id}`).toHaveProperty(id);
  });

  for (const { path, id } of pages) {
    it(`${id} on ${path}: no main-thread task over ${LONG_TASK_MS} ms while typing (${HEAVY[id] || 'defaults'})`, async () => {
      const w = await watchedPage(site.browser, site.server.origin);
      const { page } = w;
      try {
        await page.goto(`${site.server.origin}${path}?${HEAVY[id] ?? ''}`);
        const host = page.locator(`db-calculator[data-calc="${id}"]`).first();
        await host.and(page.locator('[data-ready]')).waitFor({ timeout: 30_000 });
        await settled(page, id);
        // the chart code has loaded and drawn once; from here on every task is typing's
        await page.evaluate(() => {
          const w = window as unknown as { longTasks: number[] };
          w.longTasks = [];
          new PerformanceObserver((list) => { for (const e of list.getEntries()) w.longTasks.push(e.duration); }).observe({ type: 'longtask' });
        });
        const fields = host.locator('.field:not([hidden]) input[type="text"]:not(.tol)');
        const n = Math.min(await fields.count(), 4);
        expect(n).toBeGreaterThan(0);
        for (let i = 0; i < n; i++) {
          const f = fields.nth(i);
          const was = await f.inputValue();
          await f.click();
          await f.press('End');
          await page.keyboard.type('1', { delay: 30 });
          await page.keyboard.press('Backspace', { delay: 30 });
          await page.keyboard.type('5', { delay: 30 });
          await f.fill(was);
          await f.dispatchEvent('input');
        }
        await settled(page, id);
        await page.waitForTimeout(300);
        const tasks = await page.evaluate(() => (window as unknown as { longTasks: number[] }).longTasks);
        expect(Math.max(0, ...tasks), `long tasks: ${tasks.map((t) => t.toFixed(0)).join(', ')}`).toBeLessThanOrEqual(LONG_TASK_MS);
        expect(await host.locator('.calc-state').getAttribute('data-kind')).not.toBe('busy');
        clean(w);
      } finally {
        await page.context().close();
      }
    });
  }

  it('says "Computing…" while a slow answer is on its way, and shows only the newest answer', async () => {
    const w = await watchedPage(site.browser, site.server.origin);
    const { page } = w;
    try {
      const path = pages.find((p) => p.id === 'damper-simulation')!.path;
      await page.goto(`${site.server.origin}${path}?law=coulomb&duration=60`);
      const host = page.locator('db-calculator[data-calc="damper-simulation"]').first();
      await host.and(page.locator('[data-ready]')).waitFor({ timeout: 60_000 });
      await settled(page, 'damper-simulation');
      const dur = host.locator('input[name="duration"]');
      // a long simulation, then at once a short one: the long one's answer must never show
      await dur.fill('1200');
      await expect.poll(() => host.locator('.calc-state').textContent(), { timeout: 5000 }).toMatch(/Computing/);
      await dur.fill('2');
      await settled(page, 'damper-simulation');
      const shown = await page.evaluate(() => (document.querySelector('db-calculator[data-calc="damper-simulation"]') as unknown as { values?: Record<string, unknown> }).values?.duration);
      expect(shown).toBe(2);
      await page.waitForTimeout(1500);
      expect(await page.evaluate(() => (document.querySelector('db-calculator[data-calc="damper-simulation"]') as unknown as { values?: Record<string, unknown> }).values?.duration)).toBe(2);
      expect(await host.locator('.calc-state').textContent()).toBe('');
      clean(w);
    } finally {
      await page.context().close();
    }
  });
});

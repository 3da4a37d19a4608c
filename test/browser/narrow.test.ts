/**
 * Every page readable on a 390 px phone screen (iPhone 12–15 CSS width; common practice, no
 * source): no horizontal page scroll, and nothing inside a calculator wider than the calculator —
 * wide tables and charts must scroll inside their own box or fit. Real Chromium, every built page.
 */
import { describe, expect, it } from 'vitest';
import { serveBuiltSite } from '../helpers/servedSite.ts';
import { builtPages } from '../helpers/crawl.ts';
import { ROOT_BUILD } from '../helpers/site.ts';

const site = serveBuiltSite();

/** Runs in the page: what sticks out (page scroll, and calculator children past the calculator's edges). */
function overflow(): string[] {
  const problems: string[] = [];
  const doc = document.documentElement;
  if (doc.scrollWidth > doc.clientWidth + 1) problems.push(`page scrolls sideways: ${doc.scrollWidth} px > ${doc.clientWidth} px`);
  /** Inside a box that scrolls on its own (overflow-x auto/scroll/hidden), children may be wider. */
  const clipped = (el: Element, stop: Element): boolean => {
    for (let p = el.parentElement; p && p !== stop; p = p.parentElement) {
      const o = getComputedStyle(p).overflowX;
      if (o === 'auto' || o === 'scroll' || o === 'hidden') return true;
    }
    return false;
  };
  for (const calc of document.querySelectorAll('db-calculator, .calculator')) {
    const box = calc.getBoundingClientRect();
    for (const el of calc.querySelectorAll('*')) {
      const r = el.getBoundingClientRect();
      if (r.width === 0 || r.height === 0 || clipped(el, calc)) continue;
      if (r.right > box.right + 1 || r.left < box.left - 1) {
        const name = `${el.tagName.toLowerCase()}${el.id ? `#${el.id}` : ''}${el.className && typeof el.className === 'string' ? `.${el.className.split(' ')[0]}` : ''}`;
        problems.push(`${calc.getAttribute('data-calc') ?? 'calculator'}: ${name} ${Math.round(r.left)}–${Math.round(r.right)} px outside ${Math.round(box.left)}–${Math.round(box.right)} px`);
        break;
      }
    }
  }
  return problems;
}

describe('pages at 390 px', () => {
  it('no page scrolls sideways and no calculator has a child wider than itself', async () => {
    const ctx = await site.browser.newContext({ viewport: { width: 390, height: 844 }, deviceScaleFactor: 1 });
    const page = await ctx.newPage();
    const found: string[] = [];
    for (const path of builtPages(ROOT_BUILD, '/')) {
      await page.goto(site.server.origin + path);
      await page.waitForLoadState('load');
      const n = await page.locator('db-calculator').count();
      if (n) await page.waitForFunction((count) => document.querySelectorAll('db-calculator[data-ready]').length === count, n, { timeout: 30_000 });
      // open every details box so what hides inside is measured too
      await page.evaluate(() => { for (const d of document.querySelectorAll('details')) d.open = true; });
      await page.waitForTimeout(50);
      for (const p of await page.evaluate(overflow)) found.push(`${path}: ${p}`);
    }
    await ctx.close();
    expect(found).toEqual([]);
  });
});

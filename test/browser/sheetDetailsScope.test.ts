/**
 * Sheet details belong to the page they were typed on: a calculation number typed on one page's
 * sheet panel must never print on another page's sheet in the same browser (found by hand: a
 * power-rating sheet printed with the ring-down job's calculation number). Real Chromium.
 */
import { describe, expect, it } from 'vitest';
import { watchedPage } from '../helpers/browser.ts';
import { serveBuiltSite } from '../helpers/servedSite.ts';

const site = serveBuiltSite();

describe('sheet details are kept per page', () => {
  it('a calculation number typed on the ring-down page does not appear on the power-rating page, and comes back on ring-down', async () => {
    const w = await watchedPage(site.browser, site.server.origin);
    const { page } = w;
    await page.goto(`${site.server.url}damping-tests/ring-down/`);
    await page.waitForSelector('[data-sheet-panel][data-ready]');
    await page.locator('.sheet-details summary').click();
    await page.fill('[data-sheet-field="calc"]', 'TW-077-C-011');
    await page.fill('[data-sheet-field="project"]', 'Instrument mounts');
    await expect.poll(() => page.locator('[data-sheet="calc"]').first().textContent()).toBe('TW-077-C-011');

    // a plain link to another page (no sheet parameters in its address): the same browser storage
    await page.goto(`${site.server.url}thermal/power-rating/`);
    await page.waitForSelector('[data-sheet-panel][data-ready]');
    expect(await page.locator('[data-sheet-field="calc"]').inputValue()).toBe('');
    expect(await page.locator('[data-sheet-field="project"]').inputValue()).toBe('');
    expect(await page.locator('[data-sheet="calc"]').first().textContent()).toBe('');
    expect(await page.locator('#sheet-page-css').textContent()).not.toContain('TW-077-C-011');

    await page.goto(`${site.server.url}damping-tests/ring-down/`);
    await page.waitForSelector('[data-sheet-panel][data-ready]');
    expect(await page.locator('[data-sheet-field="calc"]').inputValue()).toBe('TW-077-C-011');
    expect(w.pageErrors).toEqual([]);
  });

  it('ignores and removes the shared storage key of earlier versions', async () => {
    const w = await watchedPage(site.browser, site.server.origin);
    const { page } = w;
    await page.goto(`${site.server.url}thermal/power-rating/`);
    await page.evaluate(() => localStorage.setItem('dampbook:sheet', JSON.stringify({ calc: 'LEAKED-7' })));
    await page.reload();
    await page.waitForSelector('[data-sheet-panel][data-ready]');
    expect(await page.locator('[data-sheet-field="calc"]').inputValue()).toBe('');
    expect(await page.evaluate(() => localStorage.getItem('dampbook:sheet'))).toBeNull();
  });

  it('a study opened from the address gives the sheet its calculation number at once, not on the next load', async () => {
    const w = await watchedPage(site.browser, site.server.origin);
    const { page } = w;
    // the TW-210 class D demo study (content/studies/) has the road page as its first step
    await page.goto(`${site.server.url}duty/road-power/?study=tw-210-rear-damper-class-d`);
    await page.waitForSelector('db-calculator[data-calc="road-power"][data-study]');
    await expect.poll(() => page.locator('[data-sheet="calc"]').first().textContent()).toBe('TW-210-C-031');
    expect(await page.locator('[data-sheet-field="project"]').inputValue()).toBe('Fellrunner site utility vehicle');
    expect(await page.locator('#sheet-page-css').textContent()).toContain('TW-210-C-031');
    expect(w.pageErrors).toEqual([]);
  });
});

/**
 * Fields that never mislead (each case was found by hand and failed before its fix): the unit menu
 * converts and says so, with a way to keep the typed number; a number typed with its unit is read
 * in that unit and switches the menu; copied links keep typed units and say when data could not
 * travel; invalid fields mark results not current and disable hand-offs; a decimal comma is
 * refused like the CLI refuses it; address values the page does not take are named at their field;
 * a saved set keeps the fields that were hidden when it was saved. Real Chromium.
 * Reference values: ωₙ = √(k/m) (Rao, Mechanical Vibrations, 6th ed., §2.2; closed form).
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { watchedPage, calculatorsReady } from '../helpers/browser.ts';
import { serveBuiltSite } from '../helpers/servedSite.ts';

const site = serveBuiltSite();

async function open(url: string): Promise<Page> {
  const w = await watchedPage(site.browser, site.server.origin);
  await w.page.goto(`${site.server.url}${url}`);
  await w.page.waitForSelector('db-calculator[data-ready]');
  return w.page;
}
const out = (page: Page, key: string) => page.locator(`tr[data-out="${key}"] .value`).first().textContent();
const settle = (page: Page) => page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(() => r(null)))));

describe('unit menu and typed units', () => {
  it('choosing N/mm after typing 250 in N/m converts to 0.25 N/mm, says so, and "keep 250" keeps the number', async () => {
    const page = await open('oscillators/sdof/');
    await page.fill('#c-sdof-m', '10');
    await page.fill('#c-sdof-k', '250');
    await page.selectOption('select[name="k.unit"]', 'N/mm');
    await settle(page);
    expect(await page.inputValue('#c-sdof-k')).toBe('0.25');
    const note = page.locator('.field[data-key="k"] .unit-note');
    expect(await note.textContent()).toContain('250 N/m → 0.25 N/mm');
    expect(await out(page, 'wn')).toBe('5'); // √(250/10) = 5 rad/s: the physical value was kept
    await note.locator('button').click();
    await settle(page);
    expect(await page.inputValue('#c-sdof-k')).toBe('250');
    expect(await page.inputValue('select[name="k.unit"]')).toBe('N/mm');
    expect(await out(page, 'wn')).toBe('158.1'); // √(250 000/10)
  });

  it('an out-of-range value is converted, not reinterpreted', async () => {
    const page = await open('oscillators/sdof/');
    await page.fill('#c-sdof-k', '2e10'); // above the 1e10 N/m limit
    await page.selectOption('select[name="k.unit"]', 'kN/m');
    await settle(page);
    expect(await page.inputValue('#c-sdof-k')).toBe('20000000');
  });

  it('"22 kN/m" typed into the field switches the menu, and a copied link brings 22 kN/m back', async () => {
    const page = await open('oscillators/sdof/');
    await page.fill('#c-sdof-k', '22 kN/m');
    await page.locator('#c-sdof-k').press('Tab');
    await settle(page);
    expect(await page.inputValue('select[name="k.unit"]')).toBe('kN/m');
    expect(await page.inputValue('#c-sdof-k')).toBe('22');
    await expect.poll(() => new URL(page.url()).searchParams.get('k')).toBe('22 kN/m');
    const again = await open(`oscillators/sdof/${new URL(page.url()).search}`);
    expect(await again.inputValue('select[name="k.unit"]')).toBe('kN/m');
    expect(await again.inputValue('#c-sdof-k')).toBe('22');
    expect(await out(again, 'wn')).toBe(await out(page, 'wn'));
  });

  it('a decimal comma is refused at the field with the rule', async () => {
    const page = await open('oscillators/sdof/');
    await page.fill('#c-sdof-m', '1,5');
    await settle(page);
    expect(await page.locator('.field[data-key="m"] .msg').textContent()).toContain('decimal point');
  });
});

describe('stale results', () => {
  it('an invalid field marks results and charts not current and disables the hand-off links', async () => {
    const page = await open('oscillators/forced-response/');
    const feed = page.locator('a[data-feed-out]').first();
    expect(await feed.getAttribute('href')).toBeTruthy();
    await page.locator('db-calculator input[type="text"]').first().fill('abc');
    await settle(page);
    expect(await page.locator('db-calculator').first().getAttribute('data-stale')).not.toBeNull();
    expect(await page.locator('.calc-results table').first().getAttribute('data-not-current')).not.toBeNull();
    expect(await page.locator('.calc-state').first().textContent()).toContain('Not current');
    expect(await feed.getAttribute('href')).toBeNull();
    expect(await feed.getAttribute('aria-disabled')).toBe('true');
    await page.locator('db-calculator input[type="text"]').first().fill('10');
    await settle(page);
    expect(await feed.getAttribute('href')).toMatch(/\?/);
  });
});

describe('what a link carries', () => {
  it('an invalid choice and an over-long number in the address are named at their fields', async () => {
    const page = await open(`damper-laws/energy-per-cycle/?law=Power&X=${'1'.repeat(300)}`);
    expect(await page.locator('.field[data-key="law"] .addr-note').textContent()).toContain('not an option');
    expect(await page.locator('.field[data-key="X"] .addr-note').textContent()).toContain('too long');
  });

  it('a record that a link cannot carry is named on the other end', async () => {
    const page = await open('duty/recorded-motion/');
    const area = page.locator('db-calculator textarea').first();
    const name = await area.getAttribute('name');
    // with a force column: the page's default layout reads a measured force
    await area.fill('t,x,F\n0,0,1\n0.01,0.001,1\n0.02,0.002,0\n0.03,0.001,-1\n0.04,0,-1\n0.05,-0.001,-1\n0.06,-0.002,0\n0.07,-0.001,1\n0.08,0,1');
    await settle(page);
    await expect.poll(() => new URL(page.url()).searchParams.get(`${name}.sha`)).toMatch(/^[0-9a-f]{8}$/);
    const again = await open(`duty/recorded-motion/${new URL(page.url()).search}`);
    expect(await again.locator(`.field[data-key="${name}"] .addr-note`).textContent()).toContain('checksum');
  });

  it('a saved set keeps the fields that were hidden when it was saved (law switched after loading)', async () => {
    const page = await open('damper-laws/energy-per-cycle/');
    await page.evaluate(() => {
      const el = document.querySelector('db-calculator') as unknown as { values: Record<string, unknown>; applyInputs(v: unknown, s: unknown): void; inputsShown(): unknown };
      el.applyInputs({ ...el.values }, el.inputsShown()); // saved with the linear law: Ff was hidden and has no value
    });
    await page.selectOption('select[name="law"]', 'coulomb');
    await settle(page);
    expect(await page.locator('.field[data-key="Ff"] .msg').textContent()).toBe('');
    expect(await page.inputValue('input[name="Ff"]')).not.toBe('');
  });
});

describe('hand-off links keep the unit system', () => {
  // 1 Btu/(h·°F) = 0.29307107 W × 1.8 /K = 0.527528 W/K (NIST SP 811, 2008 ed., App. B.9: Btu_IT/h and °F interval)
  const W_PER_K_PER_BTU_H_F = 0.29307107 * 1.8;
  it('a reader in US units follows "Warm-up with this UA" and lands in US units, with the same UA', async () => {
    const page = await open('thermal/steady-temperature/?units=US');
    const link = page.locator('a[data-feed-out="UA"]', { hasText: 'Warm-up' });
    const href = new URL((await link.getAttribute('href'))!, site.server.origin);
    expect(href.searchParams.get('units')).toBe('US');
    const uaSI = Number(href.searchParams.get('UA')); // the value travels in SI (W/K)
    const shown = Number(await out(page, 'UA')); // Btu/(h·°F), 4 significant digits
    expect(Math.abs(uaSI / W_PER_K_PER_BTU_H_F - shown) / shown).toBeLessThan(5e-4);
    await Promise.all([page.waitForURL(/\/thermal\/warm-up\//), link.click()]);
    await calculatorsReady(page);
    expect(await page.locator('input[name="units"][value="US"]').isChecked()).toBe(true);
    expect(await page.inputValue('select[name="UA.unit"]')).toBe('Btu/hF');
    expect(Math.abs(Number(await page.inputValue('input[name="UA"]')) * W_PER_K_PER_BTU_H_F - uaSI) / uaSI).toBeLessThan(1e-9);
  });
});

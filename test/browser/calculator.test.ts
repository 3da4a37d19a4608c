/** Real Chromium against the built site served on 127.0.0.1: the oscillator page end to end. */
// Sources of the numbers checked here: closed forms of Rao, Mechanical Vibrations, 6th ed., §2.6
// (ωn = √(k/m), ζ = c/2√(km); provenance: closed form) and NIST SP 811 (2008), Appendix B.8
// (1 lb = 0.45359237 kg; published).
import { describe, expect, it } from 'vitest';
import { watchedPage } from '../helpers/browser.ts';
import { serveBuiltSite } from '../helpers/servedSite.ts';

const site = serveBuiltSite();

describe('oscillator page in Chromium', () => {
  it('recomputes results and charts on input, keeps inputs in the URL, stays on 127.0.0.1, logs no error', async () => {
    const w = await watchedPage(site.browser, site.server.origin);
    const { page } = w;
    await page.goto(`${site.server.url}oscillators/sdof/`);
    await page.waitForSelector('db-calculator[data-ready]');
    await page.waitForSelector('figure[data-chart="response"] canvas');
    const zeta = page.locator('tr[data-out="zeta"] .value');
    await expect.poll(() => zeta.textContent()).toBe('0.1');
    // the response chart's summary names ζ, so it must change with c (the energy chart's states the
    // audit closure, which reads 1e-13 at the rounding level for any c)
    const summaryBefore = await page.locator('figure[data-chart="response"] .chart-summary').textContent();

    await page.fill('#c-sdof-c', '80');
    await expect.poll(() => zeta.textContent()).toBe('0.2');
    await expect.poll(() => page.locator('figure[data-chart="response"] canvas').getAttribute('aria-label')).not.toContain(summaryBefore ?? '');
    await expect.poll(() => page.locator('figure[data-chart="response"] canvas').getAttribute('aria-label')).toContain('ζ = 0.200');
    expect(new URL(page.url()).searchParams.get('c')).toBe('80');

    // overdamped: the optional log decrement disappears and the regime changes
    await page.fill('#c-sdof-c', '1000');
    await expect.poll(() => page.locator('tr[data-out="regime"] .value').textContent()).toBe('overdamped');
    expect(await page.locator('tr[data-out="logdec"] .value').textContent()).toBe('—');

    expect(w.consoleErrors).toEqual([]);
    expect(w.pageErrors).toEqual([]);
    expect(w.foreignRequests).toEqual([]);
  });

  it('shows a message at a bad field and leaves the rest of the page working', async () => {
    const w = await watchedPage(site.browser, site.server.origin);
    const { page } = w;
    await page.goto(`${site.server.url}oscillators/sdof/`);
    await page.waitForSelector('db-calculator[data-ready]');
    await page.fill('#c-sdof-m', '-3');
    await expect.poll(() => page.locator('.field[data-key="m"] .msg').textContent()).toMatch(/Out of range: at least 1e-6 kg/);
    expect(await page.locator('.field[data-key="m"]').getAttribute('data-invalid')).toBe('');
    await page.fill('#c-sdof-m', 'abc');
    await expect.poll(() => page.locator('.field[data-key="m"] .msg').textContent()).toMatch(/Not a number/);
    // no NaN anywhere on the page, and the rest still responds
    expect(await page.locator('.calc-results').textContent()).not.toMatch(/NaN|Infinity/);
    await page.fill('#c-sdof-m', '10');
    await page.fill('#c-sdof-k', '16000');
    await expect.poll(() => page.locator('tr[data-out="wn"] .value').textContent()).toBe('40');
    expect(w.pageErrors).toEqual([]);
  });

  it('converts a field when its unit changes and switches the whole calculator to US units', async () => {
    const w = await watchedPage(site.browser, site.server.origin);
    const { page } = w;
    await page.goto(`${site.server.url}oscillators/sdof/`);
    await page.waitForSelector('db-calculator[data-ready]');
    await page.selectOption('select[name="m.unit"]', 'lb');
    expect(Number(await page.inputValue('#c-sdof-m'))).toBeCloseTo(22.0462262, 5); // 10 kg in lb (NIST SP 811 B.8)
    await expect.poll(() => page.locator('tr[data-out="wn"] .value').textContent()).toBe('20');
    await page.check('input[name="units"][value="US"]');
    await expect.poll(() => page.locator('tr[data-out="ccr"] .unit').textContent()).toBe('lbf·s/in');
    await expect.poll(() => page.locator('tr[data-out="wn"] .value').textContent()).toBe('20');
    expect(w.pageErrors).toEqual([]);
  });

  it('converts the power-law force at reference velocity like any force when the calculator switches to US units', async () => {
    // F_ref and v_ref carry the power law's C = F_ref/v_ref^α in ordinary force and velocity units
    const w = await watchedPage(site.browser, site.server.origin);
    const { page } = w;
    await page.goto(`${site.server.url}damper-laws/energy-per-cycle/?law=power&Fref=800&vref=1&alpha=0.5&X=0.025&f=1.5`);
    await page.waitForSelector('db-calculator[data-ready]');
    const E = page.locator('tr[data-out="E"] .value');
    await expect.poll(() => E.textContent()).toBe('33.94'); // λ(0.5)·C·ω^α·X^1.5, λ(0.5) = 3.49608 (FEMA 274 §9.3, from memory)
    await page.check('input[name="units"][value="US"]');
    await expect.poll(() => page.inputValue('select[name="Fref.unit"]')).not.toBe('N');
    await expect.poll(() => page.locator('tr[data-out="E"] .unit').textContent()).not.toBe('J');
    await page.check('input[name="units"][value="SI"]');
    await expect.poll(() => E.textContent()).toBe('33.94');
    expect(w.pageErrors).toEqual([]);
  });

  it('reproduces results from a shared link', async () => {
    const w = await watchedPage(site.browser, site.server.origin);
    await w.page.goto(`${site.server.url}oscillators/sdof/?m=10&k=4000&c=120`);
    await w.page.waitForSelector('db-calculator[data-ready]');
    await expect.poll(() => w.page.locator('tr[data-out="zeta"] .value').textContent()).toBe('0.3');
  });

  it('search finds the oscillator page', async () => {
    const w = await watchedPage(site.browser, site.server.origin);
    const { page } = w;
    await page.goto(site.server.url);
    await page.fill('#finder-q', 'logarithmic decrement');
    await page.waitForSelector('#finder-results li a');
    const links = await page.locator('#finder-results li a').evaluateAll((as) => as.map((a) => (a as HTMLAnchorElement).getAttribute('href')));
    expect(links).toContain('/oscillators/sdof/');
    expect(w.foreignRequests).toEqual([]);
    expect(w.consoleErrors).toEqual([]);
  });
});

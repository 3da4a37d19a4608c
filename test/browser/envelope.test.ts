/**
 * Tolerances, result ranges and the sweep chart on a built page in Chromium, in SI and US units.
 * Source of the numbers: closed form ζ = c/(2√(km)) and c_cr = 2√(km) (Rao, Mechanical
 * Vibrations, 6th ed., §2.6; provenance: closed form) at the sdof defaults m = 10 kg,
 * k = 4000 N/m, c = 40 N·s/m; 1 lb = 0.45359237 kg (NIST SP 811 (2008), Appendix B.8; published).
 */
import { describe, expect, it } from 'vitest';
import { watchedPage } from '../helpers/browser.ts';
import { serveBuiltSite } from '../helpers/servedSite.ts';

const site = serveBuiltSite();
const LB = 0.45359237;

describe('tolerances and sweep on the oscillator page', () => {
  it('shows ζ from 0.085 to 0.115 for c ± 15 %, 0.08104 to 0.1212 with m 9..11 kg, the same in US units', async () => {
    const w = await watchedPage(site.browser, site.server.origin);
    const { page } = w;
    await page.goto(`${site.server.url}oscillators/sdof/`);
    await page.waitForSelector('db-calculator[data-calc="sdof"][data-tools]');
    const host = page.locator('db-calculator[data-calc="sdof"]');
    await host.locator('input.vary-on').check();
    await host.locator('input[name="c.tol"]').fill('±15%');
    await page.waitForSelector('db-calculator[data-calc="sdof"][data-envelope]');
    const zeta = host.locator('tr[data-out="zeta"] td.env');
    await expect.poll(() => zeta.textContent()).toBe('0.085 – 0.115');
    expect(await host.locator('tr[data-out="zeta"] td.drv span').allTextContents()).toEqual(['min: Damping coefficient low', 'max: Damping coefficient high']);
    expect(await host.locator('.env-method').textContent()).toMatch(/all 2\^1 = 2 corners \+ 64 interior samples/);
    // the nominal value stays beside the range
    expect(await host.locator('tr[data-out="zeta"] .value').textContent()).toBe('0.1');

    await host.locator('input[name="m.tol"]').fill('9..11');
    await expect.poll(() => zeta.textContent()).toBe('0.08104 – 0.1212');
    expect(await host.locator('tr[data-out="zeta"] td.drv span').allTextContents()).toEqual(['min: Moving mass high, Damping coefficient low', 'max: Moving mass low, Damping coefficient high']);
    // ωn = √(k/m) does not depend on c: only the mass sets its ends
    expect(await host.locator('tr[data-out="wn"] td.drv span').allTextContents()).toEqual(['min: Moving mass high', 'max: Moving mass low']);

    // US units: the field and its range convert alike; ranges show in the US unit, SI values unchanged
    await host.locator('input[name="units"][value="US"]').check();
    await expect.poll(() => host.locator('tr[data-out="ccr"] .unit').textContent()).not.toBe('N·s/m');
    await page.waitForSelector('db-calculator[data-calc="sdof"][data-envelope]');
    await expect.poll(() => host.locator('input[name="m.tol"]').inputValue()).toBe(`${Number((9 / LB).toPrecision(10))}..${Number((11 / LB).toPrecision(10))}`);
    await expect.poll(() => zeta.textContent()).toBe('0.08104 – 0.1212');
    const ccr = host.locator('tr[data-out="ccr"] td.env');
    expect(Number(await ccr.getAttribute('data-min'))).toBeCloseTo(2 * Math.sqrt(4000 * 9), 6);
    expect(Number(await ccr.getAttribute('data-max'))).toBeCloseTo(2 * Math.sqrt(4000 * 11), 6);
    // a range typed in the shown unit (lb) reads through the same unit path as the field
    await host.locator('input[name="m.tol"]').fill('19.84160358..24.25084882');
    await page.waitForSelector('db-calculator[data-calc="sdof"][data-envelope]');
    await expect.poll(async () => Number(await zeta.getAttribute('data-max'))).toBeCloseTo(46 / (2 * Math.sqrt(4000 * 9)), 8);
    expect(await host.locator('.env-method').textContent()).toMatch(/all 2\^2 = 4 corners/);

    // a range outside the valid range is named at its box; the envelope says it was not computed
    await host.locator('input[name="c.tol"]').fill('-1..1');
    await expect.poll(() => host.locator('.field[data-key="c"] .tol-msg').textContent()).toMatch(/valid range/);
    await expect.poll(() => host.locator('.env-method').textContent()).toMatch(/not computed/);
    expect(await host.locator('td.env').count()).toBe(0);

    // the printed sheet carries the ranges
    await host.locator('input[name="c.tol"]').fill('±15%');
    await page.waitForSelector('db-calculator[data-calc="sdof"][data-envelope]');
    await page.emulateMedia({ media: 'print' });
    expect(await zeta.isVisible()).toBe(true);
    expect(await host.locator('.env-method').isVisible()).toBe(true);
    await page.emulateMedia({ media: 'screen' });

    expect(w.consoleErrors).toEqual([]);
    expect(w.pageErrors).toEqual([]);
  });

  it('draws a sweep chart of ζ against c with the nominal point', async () => {
    const w = await watchedPage(site.browser, site.server.origin);
    const { page } = w;
    await page.goto(`${site.server.url}oscillators/sdof/`);
    await page.waitForSelector('db-calculator[data-calc="sdof"][data-tools]');
    const host = page.locator('db-calculator[data-calc="sdof"]');
    await host.locator('details.calc-sweep > summary').click();
    await host.locator('select.sweep-in').selectOption('c');
    expect(await host.locator('input.sweep-lo').inputValue()).toBe('20');
    expect(await host.locator('input.sweep-hi').inputValue()).toBe('60');
    await host.locator('select.sweep-out').selectOption('zeta');
    await host.locator('button.sweep-draw').click();
    await page.waitForSelector('db-calculator[data-calc="sdof"][data-sweep]');
    expect(await host.locator('figure[data-chart="sweep"] canvas').count()).toBe(1);
    // ζ = c/400: 0.05 … 0.15 over 20 … 60 N·s/m, nominal 0.1 at 40 N·s/m
    expect(await host.locator('figure[data-chart="sweep"] .chart-summary').textContent()).toBe('Over 20 N·s/m to 60 N·s/m, Damping ratio ζ runs from 0.05 to 0.15; nominal 0.1 at 40 N·s/m.');
    expect(w.consoleErrors).toEqual([]);
    expect(w.pageErrors).toEqual([]);
  });
});

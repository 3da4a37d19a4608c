import { serveStatic } from '../src/server/staticServer.ts';
import { launch } from '../test/helpers/browser.ts';
const served = await serveStatic('.test-out/root', '/');
const browser = await launch();
const pages = ['duty/property-bounds/', 'duty/test-protocol/', 'duty/random-duty/', 'duty/storey-dampers/', 'thermal/gas-charge/', 'thermal/thermal-life/', 'duty/impact/', 'duty/road-power/', 'thermal/steady-temperature/'];
for (const w of [1280, 390]) {
  const ctx = await browser.newContext({ viewport: { width: w, height: 900 } });
  const page = await ctx.newPage();
  const errs: string[] = []; page.on('pageerror', (e) => errs.push(String(e)));
  for (const p of pages) {
    await page.goto(`${served.url}${p}`);
    await page.waitForSelector('db-calculator[data-ready]');
    await page.waitForTimeout(300);
    const wide = await page.evaluate(() => document.documentElement.scrollWidth);
    const calc = page.locator('db-calculator').first();
    await calc.screenshot({ path: `/tmp/shot-${w}-${p.replace(/\//g, '_')}.png` });
    console.log(w, p, 'scrollWidth', wide, errs.splice(0).join(' | '));
  }
  await ctx.close();
}
await browser.close(); await served.close();

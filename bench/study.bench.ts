/**
 * Opening a five-step study in Chromium: the TW-210 class D study opened from the road page's
 * address, measured in the page from the load event to the moment the calculator holds its step's
 * values (study code loaded, study fetched, validated, all five steps run, fields filled), and the
 * time of one whole-study recompute after a change. Target: ≤ 150 ms after load (issue: studies).
 * Needs a built site: dist/ (npm run build) or DAMPBOOK_SITE=<folder>. Run: npx tsx bench/study.bench.ts
 */
import { existsSync } from 'node:fs';
import { serveStatic } from '../src/server/staticServer.ts';
import { launch } from '../test/helpers/browser.ts';
import { median } from './lib/timing.ts';

const SITE = process.env.DAMPBOOK_SITE ?? (existsSync('dist/index.html') ? 'dist' : '.test-out/root');
const RUNS = 9;

const served = await serveStatic(SITE, '/');
const browser = await launch();
const open: number[] = [];
const reopen: number[] = [];
/** From the navigation start: what a reader waits for (the load event comes earlier since pages no longer preload every calculator). */
const openTotal: number[] = [];
const reopenTotal: number[] = [];
const recompute: number[] = [];
/** When the page's first script started the study's loading, from the navigation start. */
const early: number[] = [];
const sinceLoad = () => {
  const nav = performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming;
  const attached = performance.getEntriesByName('db-study-attached')[0]!.startTime;
  return [attached - nav.loadEventEnd, attached];
};
try {
  for (let i = 0; i < RUNS; i++) {
    const page = await (await browser.newContext()).newPage();
    await page.goto(`${served.url}duty/road-power/?study=tw-210-rear-damper-class-d`);
    await page.waitForSelector('db-calculator[data-calc="road-power"][data-study]');
    const [o, ot] = await page.evaluate(sinceLoad);
    open.push(o!); openTotal.push(ot!);
    early.push(await page.evaluate(() => performance.getEntriesByName('db-study-early')[0]?.startTime ?? NaN));
    await page.fill('input[name="V"]', String(16 + i));
    await page.waitForFunction(() => performance.getEntriesByName('db-study-run').length >= 2);
    recompute.push(await page.evaluate(() => performance.getEntriesByName('db-study-run').at(-1)!.duration));
    // the next step's page, with the study already open in this browser (the usual case)
    await page.goto(`${served.url}thermal/warm-up/`);
    await page.waitForSelector('db-calculator[data-calc="warm-up"][data-study]');
    const [r, rt] = await page.evaluate(sinceLoad);
    reopen.push(r!); reopenTotal.push(rt!);
    await page.context().close();
  }
} finally {
  await browser.close();
  await served.close();
}
console.log(`study open (5 steps) after load: median ${median(open).toFixed(1)} ms, worst ${Math.max(...open).toFixed(1)} ms; target ≤ 150 ms: ${median(open) <= 150 ? 'met' : 'NOT MET'}`);
console.log(`next step's page, study already open: median ${median(reopen).toFixed(1)} ms, worst ${Math.max(...reopen).toFixed(1)} ms; target ≤ 150 ms: ${median(reopen) <= 150 ? 'met' : 'NOT MET'}`);
console.log(`the same from the navigation start: study open median ${median(openTotal).toFixed(1)} ms, next step's page ${median(reopenTotal).toFixed(1)} ms`);
if (early.every(Number.isFinite)) console.log(`the study's loading started (first script ran) at median ${median(early).toFixed(1)} ms from the navigation start`);
console.log(`whole-study recompute after a change: median ${median(recompute).toFixed(1)} ms, worst ${Math.max(...recompute).toFixed(1)} ms`);
